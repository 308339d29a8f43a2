import { infiniteQueryOptions, useInfiniteQuery } from "@tanstack/react-query";
import { z } from "zod";
import { auditListSchema } from "#shared/schemas/audit";
import { apiFetch } from "#shared/ui/index";

export const AUDIT_PAGE_SIZE = 50;

export type AuditEntry = z.infer<typeof auditListSchema>["entries"][number];
export interface AuditFilter {
  subjectType?: string;
  subjectId?: string;
}

export async function getAudit(filter: AuditFilter, before: number | undefined, signal?: AbortSignal): Promise<AuditEntry[]> {
  const search = new URLSearchParams({ limit: String(AUDIT_PAGE_SIZE) });
  if (filter.subjectType) search.set("subjectType", filter.subjectType);
  if (filter.subjectId) search.set("subjectId", filter.subjectId);
  if (before !== undefined) search.set("before", String(before));
  const { entries } = await apiFetch(`/api/audit?${search.toString()}`, { schema: auditListSchema, signal });
  return entries;
}

/** Newest first; each "load more" asks for entries older than the last one shown. */
export function auditQueryOptions(filter: AuditFilter) {
  return infiniteQueryOptions({
    queryKey: ["audit", filter] as const,
    queryFn: ({ pageParam, signal }) => getAudit(filter, pageParam, signal),
    initialPageParam: undefined as number | undefined,
    getNextPageParam: (lastPage) => (lastPage.length < AUDIT_PAGE_SIZE ? undefined : lastPage[lastPage.length - 1]?.id),
  });
}

export function useAudit(filter: AuditFilter) {
  return useInfiniteQuery(auditQueryOptions(filter));
}
