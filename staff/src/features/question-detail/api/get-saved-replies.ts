import { queryOptions, useQuery } from "@tanstack/react-query";
import { savedReplyListSchema, type SavedReply } from "#shared/schemas/saved-replies";
import { apiFetch } from "#shared/ui/index";

/** The replies the manager keeps for common questions, with their placeholders unfilled. */
export async function getSavedReplies(signal?: AbortSignal): Promise<SavedReply[]> {
  const { replies } = await apiFetch("/api/saved-replies", { schema: savedReplyListSchema, signal });
  return replies;
}

export function savedRepliesQueryOptions() {
  return queryOptions({
    queryKey: ["saved-replies"] as const,
    queryFn: ({ signal }) => getSavedReplies(signal),
    staleTime: 5 * 60_000,
  });
}

export function useSavedReplies() {
  return useQuery(savedRepliesQueryOptions());
}
