import { useMutation, useQueryClient } from "@tanstack/react-query";
import { followUpResponseSchema, type CreateFollowUp, type FollowUp } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";
import { followUpsKey } from "./get-follow-ups.ts";

export async function createFollowUp(body: CreateFollowUp): Promise<FollowUp> {
  const { followUp } = await apiFetch("/api/follow-ups", { method: "POST", body, schema: followUpResponseSchema });
  return followUp;
}

/** Adds a follow-up straight from the follow-ups page, with no question behind it. */
export function useCreateFollowUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFollowUp,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: followUpsKey }), queryClient.invalidateQueries({ queryKey: ["customers"] })]),
  });
}
