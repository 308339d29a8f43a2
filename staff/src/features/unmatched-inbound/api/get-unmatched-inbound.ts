import { queryOptions, useQuery } from "@tanstack/react-query";
import { unmatchedInboundListSchema, type UnmatchedInbound } from "#shared/schemas/unmatched-inbound";
import { apiFetch } from "#shared/ui/index";

export async function getUnmatchedInbound(signal?: AbortSignal): Promise<UnmatchedInbound[]> {
  const { items } = await apiFetch("/api/unmatched-inbound", { schema: unmatchedInboundListSchema, signal });
  return items;
}

export const unmatchedInboundKey = ["unmatched-inbound"] as const;

export function unmatchedInboundQueryOptions() {
  return queryOptions({ queryKey: unmatchedInboundKey, queryFn: ({ signal }) => getUnmatchedInbound(signal) });
}

export function useUnmatchedInbound() {
  return useQuery(unmatchedInboundQueryOptions());
}
