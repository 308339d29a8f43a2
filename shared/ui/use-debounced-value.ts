import { useEffect, useState } from "react";

/**
 * The value once it has stopped changing for `delayMs`: one search or preview per pause in
 * typing, not per key. Compare by value (strings, numbers) so re-renders don't restart the wait.
 */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
