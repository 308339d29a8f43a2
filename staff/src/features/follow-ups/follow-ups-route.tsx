import { useState } from "react";
import type { FollowUp, FollowUpStatus } from "#shared/schemas/follow-ups";
import { Button, EmptyState, ErrorState, LoadingState, Notice, Page, buttonClasses } from "#shared/ui/index";
import { followUpsCsvHref } from "./api/follow-ups-csv.ts";
import { useFollowUps } from "./api/get-follow-ups.ts";
import { useStaff } from "./api/get-staff.ts";
import { AddFollowUpDialog } from "./components/add-follow-up-dialog.tsx";
import { FollowUpCards } from "./components/follow-up-cards.tsx";
import { FollowUpDialog } from "./components/follow-up-dialog.tsx";
import { FollowUpFilters } from "./components/follow-up-filters.tsx";
import { FollowUpsTable } from "./components/follow-ups-table.tsx";
import { Pager } from "./components/pager.tsx";
import { PhoneSort } from "./components/phone-sort.tsx";
import { useFollowUpQuery } from "./lib/use-follow-up-query.ts";

/** Managers track every follow-up visit and callback: move them on, record a callback's cost, export them. */
export function FollowUpsRoute() {
  const { query, update, reset } = useFollowUpQuery();
  const list = useFollowUps(query);
  const staff = useStaff();
  const [open, setOpen] = useState<{ followUp: FollowUp; targetStatus?: FollowUpStatus } | null>(null);
  const openDialog = (followUp: FollowUp, targetStatus?: FollowUpStatus) => setOpen({ followUp, targetStatus });
  const [adding, setAdding] = useState(false);
  const [added, setAdded] = useState<FollowUp | null>(null);
  const { limit, offset, ...filter } = query;
  const filtered = [query.status, query.reason, query.technicianId, query.callback, query.from, query.to].some((v) => v !== undefined);

  return (
    <Page
      title="Follow-up visits"
      width="wide"
      intro="Every return visit to a lawn. A callback is a free return visit because the result failed: record its cost and outcome so the callback report can show what causes them."
      actions={
        <div className="flex flex-wrap gap-2">
          <Button onClick={() => setAdding(true)}>Add follow-up</Button>
          <a href={followUpsCsvHref(filter)} download className={buttonClasses("secondary")}>
            Download CSV
          </a>
        </div>
      }
    >
      <div className="flex flex-col gap-5">
        {added && (
          <Notice tone="success" title="Follow-up visit added">
            {added.customerName} · {added.street} · {added.status === "scheduled" ? "booked; the homeowner is told" : "waiting for a date and a technician"}
          </Notice>
        )}
        <FollowUpFilters query={query} staff={staff.data ?? []} onChange={update} onReset={reset} />
        {list.isError && <ErrorState title="The follow-up visits didn't load" error={list.error} onRetry={() => void list.refetch()} retrying={list.isFetching} />}
        {list.isPending && !list.isError && <LoadingState label="Loading follow-up visits…" />}
        {list.data && list.data.total === 0 && (
          <EmptyState title="No follow-up visits match">
            {filtered ? "Try fewer filters or a wider date range." : "Follow-up visits booked from questions or plans will show here."}
          </EmptyState>
        )}
        {list.data && list.data.rows.length > 0 && (
          <div className={`flex flex-col gap-4 transition-opacity ${list.isPlaceholderData ? "opacity-60" : ""}`} aria-busy={list.isPlaceholderData}>
            <div className="hidden md:block">
              <FollowUpsTable rows={list.data.rows} sort={query.sort} order={query.order} onSort={(sort, order) => update({ sort, order })} onOpen={openDialog} />
            </div>
            <div className="flex flex-col gap-3 md:hidden">
              <PhoneSort sort={query.sort} order={query.order} onSort={(sort, order) => update({ sort, order })} />
              <FollowUpCards rows={list.data.rows} onOpen={openDialog} />
            </div>
            <Pager offset={offset} limit={limit} total={list.data.total} onPage={(next) => update({ offset: next })} />
          </div>
        )}
      </div>
      {adding && (
        <AddFollowUpDialog
          staff={staff.data ?? []}
          onClose={() => setAdding(false)}
          onAdded={(followUp) => {
            setAdded(followUp);
            setAdding(false);
          }}
        />
      )}
      {open && <FollowUpDialog followUp={open.followUp} targetStatus={open.targetStatus} staff={staff.data ?? []} onClose={() => setOpen(null)} />}
    </Page>
  );
}
