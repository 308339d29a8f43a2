import { onlineManager } from "@tanstack/react-query";
import { useSyncExternalStore } from "react";

/** Online as TanStack Query sees it (it listens to the browser's online/offline events). */
export function useIsOnline(): boolean {
  return useSyncExternalStore(
    (notify) => onlineManager.subscribe(notify),
    () => onlineManager.isOnline(),
    () => true,
  );
}
