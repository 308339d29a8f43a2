import type { QueryClient } from "@tanstack/react-query";

/**
 * Runs `task` once the phone has nothing better to do (at the latest after `timeoutMs`).
 * Returns a cancel function, ready to be an effect's cleanup.
 */
export function whenIdle(task: () => void, timeoutMs = 5000): () => void {
  if (typeof requestIdleCallback === "function") {
    const id = requestIdleCallback(task, { timeout: timeoutMs });
    return () => cancelIdleCallback(id);
  }
  const timer = setTimeout(task, 2000);
  return () => clearTimeout(timer);
}

/**
 * Runs `task` once no request is on its way and the phone is idle: work for later (fetching
 * what offline reading needs) then never competes with the screen being shown for a slow
 * connection. Returns a cancel function, ready to be an effect's cleanup.
 */
export function whenSettled(queryClient: QueryClient, task: () => void): () => void {
  let cancelIdle: (() => void) | undefined;
  let unsubscribe: (() => void) | undefined;
  const wait = () => {
    // Requests can start while we wait for idle (today's steps follow the plan list): check again then.
    unsubscribe = queryClient.getQueryCache().subscribe(check);
    check();
  };
  function check() {
    if (queryClient.isFetching() > 0) return;
    unsubscribe?.();
    unsubscribe = undefined;
    cancelIdle = whenIdle(() => {
      cancelIdle = undefined;
      if (queryClient.isFetching() > 0) wait();
      else task();
    });
  }
  wait();
  return () => {
    unsubscribe?.();
    cancelIdle?.();
  };
}
