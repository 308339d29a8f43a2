import { useMutation, useQueryClient } from "@tanstack/react-query";
import { followUpResponseSchema, type FollowUp, type UpdateFollowUp } from "#shared/schemas/follow-ups";
import { apiFetch } from "#shared/ui/index";
import { followUpsKey } from "./get-follow-ups.ts";

export async function updateFollowUp(id: number, patch: UpdateFollowUp): Promise<FollowUp> {
  const { followUp } = await apiFetch(`/api/follow-ups/${id}`, { method: "PATCH", body: patch, schema: followUpResponseSchema });
  return followUp;
}

/** Moves a follow-up on, or records a callback's cost and outcome. The callback report changes with it. */
export function useUpdateFollowUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: UpdateFollowUp }) => updateFollowUp(id, patch),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: followUpsKey });
      void queryClient.invalidateQueries({ queryKey: ["reports", "callbacks"] });
    },
  });
}
