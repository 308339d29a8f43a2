import { useMutation, useQueryClient } from "@tanstack/react-query";
import { followUpResponseSchema, type CreateFollowUp, type FollowUp } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";

export async function createFollowUp(body: CreateFollowUp): Promise<FollowUp> {
  const { followUp } = await apiFetch("/api/follow-ups", { method: "POST", body, schema: followUpResponseSchema });
  return followUp;
}

/** Books a follow-up visit; the follow-ups table and the customer's page pick it up. */
export function useCreateFollowUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createFollowUp,
    onSuccess: () => Promise.all([queryClient.invalidateQueries({ queryKey: ["follow-ups"] }), queryClient.invalidateQueries({ queryKey: ["customers"] })]),
  });
}
