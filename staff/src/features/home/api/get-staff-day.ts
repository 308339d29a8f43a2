import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { staffDayResponseSchema, type StaffDayResponse } from "#shared/schemas/staff-day";
import { apiFetch } from "#shared/ui/index";

/** The signed-in technician's day, or (for a manager) the company's or one picked person's. */
export async function getStaffDay(technicianId: number | null, signal?: AbortSignal): Promise<StaffDayResponse> {
  const query = technicianId === null ? "" : `?technicianId=${technicianId}`;
  return apiFetch(`/api/staff/day${query}`, { schema: staffDayResponseSchema, signal });
}

export function staffDayQueryOptions(technicianId: number | null) {
  return queryOptions({ queryKey: ["staff-day", technicianId ?? "default"] as const, queryFn: ({ signal }) => getStaffDay(technicianId, signal) });
}

/** Refreshed every minute: visits get booked and questions arrive while the home screen is open. */
export function useStaffDay(technicianId: number | null) {
  // The previous person's day stays on screen while the picked one loads, so the picker does not jump.
  return useQuery({ ...staffDayQueryOptions(technicianId), refetchInterval: 60_000, placeholderData: keepPreviousData });
}
