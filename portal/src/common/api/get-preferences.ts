import { queryOptions, useQuery } from "@tanstack/react-query";
import { preferencesResponseSchema, type PreferencesResponse } from "#shared/schemas/preferences";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "./query-keys.ts";

export function getPreferences(signal?: AbortSignal): Promise<PreferencesResponse> {
  return apiFetch("/api/my/preferences", { schema: preferencesResponseSchema, signal });
}

export function preferencesQueryOptions() {
  return queryOptions({ queryKey: portalKeys.preferences, queryFn: ({ signal }) => getPreferences(signal), staleTime: 5 * 60_000 });
}

export function usePreferences() {
  return useQuery(preferencesQueryOptions());
}
