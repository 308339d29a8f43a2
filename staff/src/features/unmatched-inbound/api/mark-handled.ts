import { useMutation, useQueryClient } from "@tanstack/react-query";
import { unmatchedInboundResponseSchema } from "#shared/schemas/unmatched-inbound";
import { apiFetch } from "#shared/ui/index";
import { unmatchedInboundKey } from "./get-unmatched-inbound.ts";

export function markHandled(id: number) {
  return apiFetch(`/api/unmatched-inbound/${id}/handled`, { method: "POST", schema: unmatchedInboundResponseSchema });
}

export function useMarkHandled() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: markHandled, onSuccess: () => queryClient.invalidateQueries({ queryKey: unmatchedInboundKey }) });
}
