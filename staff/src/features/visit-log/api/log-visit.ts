import { useMutation, useQueryClient } from "@tanstack/react-query";
import { visitLoggedSchema, type LogVisit } from "#shared/schemas/visits";
import { apiFetch } from "#shared/ui/index";

/** Saves the visit; the server creates its care plan in the same transaction. */
export function logVisit(body: LogVisit) {
  return apiFetch("/api/visits", { method: "POST", body, schema: visitLoggedSchema });
}

export function useLogVisit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: logVisit,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ["customers"] }),
  });
}
