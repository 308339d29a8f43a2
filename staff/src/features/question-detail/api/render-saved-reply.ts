import { useMutation } from "@tanstack/react-query";
import { renderedReplySchema } from "#shared/schemas/saved-replies";
import { apiFetch } from "#shared/ui/index";

/** A saved reply with this customer's first name and plan dates filled in. */
export function renderSavedReply(replyId: number, planId: number) {
  return apiFetch(`/api/saved-replies/${replyId}/render`, { method: "POST", body: { planId }, schema: renderedReplySchema });
}

export function useRenderSavedReply(planId: number) {
  return useMutation({ mutationFn: (replyId: number) => renderSavedReply(replyId, planId) });
}
