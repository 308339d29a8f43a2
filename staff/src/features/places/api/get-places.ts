import { queryOptions, useQuery } from "@tanstack/react-query";
import { placeListSchema, type Place } from "#shared/schemas/place-rules";
import { apiFetch } from "#shared/ui/index";

export const placesKey = ["places"] as const;

export async function getPlaces(signal?: AbortSignal): Promise<Place[]> {
  return (await apiFetch("/api/place-rules", { schema: placeListSchema, signal })).places;
}

export function placesQueryOptions() {
  return queryOptions({ queryKey: placesKey, queryFn: ({ signal }) => getPlaces(signal) });
}

export function usePlaces() {
  return useQuery(placesQueryOptions());
}
