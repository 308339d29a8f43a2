import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { calendarFeedResponseSchema } from "#shared/schemas/preferences";
import { apiFetch } from "#shared/ui/index";
import { portalKeys } from "../../../common/api/query-keys.ts";

export async function getCalendarFeed(signal?: AbortSignal): Promise<string> {
  const { url } = await apiFetch("/api/my/calendar", { schema: calendarFeedResponseSchema, signal });
  return url;
}

export function calendarFeedQueryOptions() {
  return queryOptions({ queryKey: portalKeys.calendarFeed, queryFn: ({ signal }) => getCalendarFeed(signal) });
}

export function useCalendarFeed() {
  return useQuery(calendarFeedQueryOptions());
}

export async function rotateCalendarFeed(): Promise<string> {
  const { url } = await apiFetch("/api/my/calendar/rotate", { method: "POST", schema: calendarFeedResponseSchema });
  return url;
}

/** A new secret link; the old one stops working at once. */
export function useRotateCalendarFeed() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: rotateCalendarFeed,
    onSuccess: (url) => queryClient.setQueryData(portalKeys.calendarFeed, url),
  });
}
