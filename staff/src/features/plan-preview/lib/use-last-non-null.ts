import { useState } from "react";

/** The value, or while it is null the last value that wasn't. */
export function useLastNonNull<T>(value: T | null): T | null {
  const [last, setLast] = useState(value);
  // Updating state while rendering is React's way to remember a previous render's value.
  if (value !== null && value !== last) setLast(value);
  return value ?? last;
}
