import { queryOptions, useQuery } from "@tanstack/react-query";
import { threadResponseSchema, type ThreadResponse } from "#shared/schemas/questions";
import { apiFetch } from "#shared/ui/index";

/** The plan's whole conversation, oldest first. Reading it marks it read for all staff. */
export async function getThread(planId: number, signal?: AbortSignal): Promise<ThreadResponse> {
  return apiFetch(`/api/plans/${planId}/thread`, { schema: threadResponseSchema, signal });
}

export function threadQueryOptions(planId: number) {
  return queryOptions({
    queryKey: ["plans", planId, "thread"] as const,
    queryFn: ({ signal }) => getThread(planId, signal),
  });
}

export function useThread(planId: number) {
  return useQuery(threadQueryOptions(planId));
}
