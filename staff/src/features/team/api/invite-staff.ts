import { useMutation, useQueryClient } from "@tanstack/react-query";
import { invitationResponseSchema, type InviteStaff } from "#shared/schemas/team";
import { apiFetch } from "#shared/ui/index";
import { teamKey } from "./get-team.ts";

export function inviteStaff(body: InviteStaff) {
  return apiFetch("/api/team/invitations", { method: "POST", body, schema: invitationResponseSchema });
}

/** Adds someone to the team (or brings a deactivated member back) and e-mails them the sign-in page. */
export function useInviteStaff() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteStaff, onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKey }) });
}
