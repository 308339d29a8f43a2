import { useSyncExternalStore } from "react";

/** Tailwind's `md` breakpoint: from here on the queue is a table, below it a list of cards. */
const wideQuery = "(min-width: 48rem)";

function subscribe(onChange: () => void) {
  const media = window.matchMedia(wideQuery);
  media.addEventListener("change", onChange);
  return () => media.removeEventListener("change", onChange);
}

/** Whether the screen is wide enough for the table (follows rotation and window resizing). */
export function useWideScreen(): boolean {
  return useSyncExternalStore(subscribe, () => window.matchMedia(wideQuery).matches);
}
