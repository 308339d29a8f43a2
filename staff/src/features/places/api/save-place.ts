import { useMutation, useQueryClient } from "@tanstack/react-query";
import { z } from "zod";
import { placeSchema, type Place, type SavePlaceInput } from "#shared/schemas/place-rules";
import { apiFetch } from "#shared/ui/index";
import { placesKey } from "./get-places.ts";

const responseSchema = z.object({ place: placeSchema });

/** Adds a place (no id) or replaces one place's rules (with its id). */
export async function savePlace({ id, body }: { id: number | null; body: SavePlaceInput }): Promise<Place> {
  const path = id === null ? "/api/place-rules" : `/api/place-rules/${id}`;
  return (await apiFetch(path, { method: id === null ? "POST" : "PUT", body, schema: responseSchema })).place;
}

export function useSavePlace() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: savePlace, onSuccess: () => queryClient.invalidateQueries({ queryKey: placesKey }) });
}
