import { useEffect, useState } from "react";

/** The value as it was once it stopped changing for `delayMs`; strings compare by content, so re-renders don't restart the wait. */
export function useDebouncedValue<T extends string | number | null>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
