import { useMutation, useQueryClient } from "@tanstack/react-query";
import { teamMemberResponseSchema, type TeamMember } from "#shared/schemas/team";
import { apiFetch } from "#shared/ui/index";
import { teamKey } from "./get-team.ts";

export function changeRole(userId: number, role: TeamMember["role"]) {
  return apiFetch(`/api/team/${userId}`, { method: "PATCH", body: { role }, schema: teamMemberResponseSchema });
}

/** Applies at once: the server reads roles on every request. */
export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: number; role: TeamMember["role"] }) => changeRole(userId, role),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKey }),
  });
}
