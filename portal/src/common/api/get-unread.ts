import { queryOptions, useQuery, type QueryClient } from "@tanstack/react-query";
import { unreadResponseSchema, type UnreadResponse } from "#shared/schemas/unread";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export function getUnread(signal?: AbortSignal): Promise<UnreadResponse> {
  return apiFetch("/api/my/unread", { schema: unreadResponseSchema, signal });
}

export function unreadQueryOptions() {
  return queryOptions({ queryKey: portalKeys.unread, queryFn: ({ signal }) => getUnread(signal) });
}

/**
 * New messages from the company, per plan. Its own small request (never part of Today's);
 * checked every minute while the portal is open, like the thread, and when the phone comes back to it.
 */
export function useUnread(enabled = true) {
  return useQuery({ ...unreadQueryOptions(), enabled, refetchInterval: 60_000, refetchOnWindowFocus: true });
}

/**
 * A plan's thread was just fetched, which marks it read on the server: drop its count at once,
 * then ask the server again for the true numbers (an answer may have arrived meanwhile).
 */
export function threadWasRead(queryClient: QueryClient, planId: number) {
  queryClient.setQueryData<UnreadResponse>(portalKeys.unread, (old) => {
    if (!old) return old;
    const plans = old.plans.filter((p) => p.planId !== planId);
    return { plans, total: plans.reduce((sum, p) => sum + p.unread, 0) };
  });
  void queryClient.invalidateQueries({ queryKey: portalKeys.unread });
}
