import { queryOptions, skipToken, useQuery } from "@tanstack/react-query";
import { propertyResponseSchema, type PropertyDetail } from "#shared/schemas/properties";
import { apiFetch } from "#shared/ui/index";

/** One lawn with its size, time zone and lawn facts: to fill in the area and check the visit against the lawn. */
export async function getProperty(id: number, signal?: AbortSignal): Promise<PropertyDetail> {
  const { property } = await apiFetch(`/api/properties/${id}`, { schema: propertyResponseSchema, signal });
  return property;
}

export function propertyQueryOptions(id: number | null) {
  return queryOptions({
    queryKey: ["properties", id] as const,
    queryFn: id ? ({ signal }) => getProperty(id, signal) : skipToken,
    staleTime: 5 * 60_000,
  });
}

export function useProperty(id: number | null) {
  return useQuery(propertyQueryOptions(id));
}
