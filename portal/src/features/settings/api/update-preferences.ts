import { useMutation, useQueryClient } from "@tanstack/react-query";
import { preferencesResponseSchema, type Preferences, type PreferencesResponse } from "#shared/schemas/preferences";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "../../../common/api/query-keys.ts";

export function updatePreferences(preferences: Preferences): Promise<PreferencesResponse> {
  return apiFetch("/api/my/preferences", { method: "PUT", body: preferences, schema: preferencesResponseSchema });
}

export function useUpdatePreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePreferences,
    onSuccess: (saved) => queryClient.setQueryData(portalKeys.preferences, saved),
  });
}
