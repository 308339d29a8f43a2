import { queryOptions, useQuery, useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { threadResponseSchema, type ThreadResponse } from "#shared/schemas/questions";
import { apiFetch } from "#shared/ui/index";
import { threadWasRead } from "./get-unread.ts";
import { portalKeys } from "./query-keys.ts";

export function getThread(planId: number, signal?: AbortSignal): Promise<ThreadResponse> {
  return apiFetch(`/api/plans/${planId}/thread`, { schema: threadResponseSchema, signal });
}

export function threadQueryOptions(planId: number) {
  return queryOptions({ queryKey: portalKeys.thread(planId), queryFn: ({ signal }) => getThread(planId, signal) });
}

export function useThread(planId: number) {
  // Answers arrive while the page is open; a minute is quick enough for a lawn question.
  const query = useQuery({ ...threadQueryOptions(planId), refetchInterval: 60_000 });
  const queryClient = useQueryClient();
  // Each fetch from the server marks the thread read, so the Messages tab and Today's notice follow.
  // A copy restored from the device was not fetched here (isFetchedAfterMount), so it changes nothing.
  const fetchedAt = query.isFetchedAfterMount && query.isSuccess ? query.dataUpdatedAt : 0;
  useEffect(() => {
    if (fetchedAt) threadWasRead(queryClient, planId);
  }, [queryClient, planId, fetchedAt]);
  return query;
}
