import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { callbackReportSchema, type CallbackReport, type CallbackReportQuery } from "#shared/schemas/callback-report";
import { apiFetch } from "#shared/ui/index";

const responseSchema = z.object({ report: callbackReportSchema });

export async function getCallbackReport(range: CallbackReportQuery, signal?: AbortSignal): Promise<CallbackReport> {
  const search = new URLSearchParams();
  if (range.from) search.set("from", range.from);
  if (range.to) search.set("to", range.to);
  const { report } = await apiFetch(`/api/reports/callbacks?${search.toString()}`, { schema: responseSchema, signal });
  return report;
}

export function callbackReportQueryOptions(range: CallbackReportQuery) {
  return queryOptions({
    // "reports", "callbacks" is what recording a callback invalidates (follow-ups feature).
    queryKey: ["reports", "callbacks", range] as const,
    queryFn: ({ signal }) => getCallbackReport(range, signal),
    placeholderData: keepPreviousData,
  });
}

export function useCallbackReport(range: CallbackReportQuery) {
  return useQuery(callbackReportQueryOptions(range));
}
