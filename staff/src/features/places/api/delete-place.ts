import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "#shared/ui/index";
import { placesKey } from "./get-places.ts";

export async function deletePlace(id: number): Promise<void> {
  await apiFetch(`/api/place-rules/${id}`, { method: "DELETE" });
}

/** Plans already made keep the rules they were made with; new plans of its lawns have no place rules. */
export function useDeletePlace() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deletePlace, onSuccess: () => queryClient.invalidateQueries({ queryKey: placesKey }) });
}
