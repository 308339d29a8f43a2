import { queryOptions, useQuery } from "@tanstack/react-query";
import { importBatchStatusSchema, type ImportBatchStatus } from "#shared/schemas/visit-import";
import { apiFetch } from "#shared/ui/index";

export function getImportStatus(batchId: number, signal?: AbortSignal): Promise<ImportBatchStatus> {
  return apiFetch(`/api/visit-imports/${batchId}`, { schema: importBatchStatusSchema, signal });
}

export function importStatusQueryOptions(batchId: number) {
  return queryOptions({
    queryKey: ["visit-imports", batchId, "status"] as const,
    queryFn: ({ signal }) => getImportStatus(batchId, signal),
  });
}

/** Polls the batch's progress while an import runs; the server writes it every 50 rows. */
export function useImportStatus(batchId: number | undefined, running: boolean) {
  return useQuery({
    ...importStatusQueryOptions(batchId ?? 0),
    enabled: running && batchId !== undefined,
    refetchInterval: running ? 1_000 : false,
    staleTime: 0,
  });
}
