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
    onSuccess: (_saved, body) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["customers"] }),
        // Slope and shade noted on the visit are now on the lawn's record.
        ...(body.lawn ? [queryClient.invalidateQueries({ queryKey: ["properties", body.propertyId] })] : []),
      ]),
  });
}
