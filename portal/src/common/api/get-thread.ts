import { queryOptions, useQuery } from "@tanstack/react-query";
import { threadResponseSchema, type ThreadResponse } from "#shared/schemas/questions";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export function getThread(planId: number, signal?: AbortSignal): Promise<ThreadResponse> {
  return apiFetch(`/api/plans/${planId}/thread`, { schema: threadResponseSchema, signal });
}

export function threadQueryOptions(planId: number) {
  return queryOptions({ queryKey: portalKeys.thread(planId), queryFn: ({ signal }) => getThread(planId, signal) });
}

export function useThread(planId: number) {
  // Answers arrive while the page is open; a minute is quick enough for a lawn question.
  return useQuery({ ...threadQueryOptions(planId), refetchInterval: 60_000 });
}
