import { useMutation, useQueryClient } from "@tanstack/react-query";
import { teamMemberResponseSchema } from "#shared/schemas/team";
import { apiFetch } from "#shared/ui/index";
import { teamKey } from "./get-team.ts";

export function deactivateStaff(userId: number) {
  return apiFetch(`/api/team/${userId}/deactivate`, { method: "POST", schema: teamMemberResponseSchema });
}

/** Deactivates a member and ends all their sessions on the server in the same step. */
export function useDeactivateStaff() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deactivateStaff, onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKey }) });
}
