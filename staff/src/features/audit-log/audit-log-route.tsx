import { useSearchParams } from "react-router-dom";
import { Button, EmptyState, ErrorState, LoadingState, Page } from "#shared/ui/index";
import { useAudit, type AuditFilter } from "./api/get-audit.ts";
import { AuditEntries } from "./components/audit-entries.tsx";
import { AuditFilterForm } from "./components/audit-filter-form.tsx";

/** Who on the staff read or changed which customer record, newest first. */
export function AuditLogRoute() {
  const [params, setParams] = useSearchParams();
  const filter: AuditFilter = { subjectType: params.get("subjectType") ?? undefined, subjectId: params.get("subjectId") ?? undefined };
  const audit = useAudit(filter);
  const entries = audit.data?.pages.flat() ?? [];

  const setFilter = (next: AuditFilter) => {
    const search = new URLSearchParams();
    if (next.subjectType) search.set("subjectType", next.subjectType);
    if (next.subjectId) search.set("subjectId", next.subjectId);
    setParams(search);
  };

  return (
    <Page title="Audit log" width="wide" intro="Every time someone on the staff opened or changed a customer's records, the team or the company's rules, newest first.">
      <div className="flex flex-col gap-5">
        <AuditFilterForm key={params.toString()} filter={filter} onChange={setFilter} />
        {audit.isError && <ErrorState title="The audit log didn't load" error={audit.error} onRetry={() => void audit.refetch()} retrying={audit.isFetching} />}
        {audit.isPending && !audit.isError && <LoadingState label="Loading the audit log…" />}
        {audit.isSuccess && entries.length === 0 && (
          <EmptyState title="Nothing recorded">{filter.subjectType || filter.subjectId ? "Nothing matches this filter." : "Reads and changes of customer records will show here."}</EmptyState>
        )}
        {entries.length > 0 && (
          <>
            <AuditEntries entries={entries} />
            <div className="flex flex-wrap items-center gap-3">
              <p className="text-ink-soft" aria-live="polite">
                {entries.length} {entries.length === 1 ? "entry" : "entries"} shown
                {!audit.hasNextPage && " — that's all"}
              </p>
              {audit.hasNextPage && (
                <Button variant="secondary" onClick={() => void audit.fetchNextPage()} pending={audit.isFetchingNextPage} pendingLabel="Loading…">
                  Load older entries
                </Button>
              )}
            </div>
          </>
        )}
      </div>
    </Page>
  );
}
