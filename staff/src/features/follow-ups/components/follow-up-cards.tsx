import { followUpReasonLabels, type FollowUp, type FollowUpStatus } from "#shared/schemas/follow-ups";
import { formatDay } from "../lib/labels.ts";
import { CallbackCost } from "./callback-cost.tsx";
import { FollowUpActions } from "./follow-up-actions.tsx";
import { CallbackBadge, StatusBadge } from "./status-badge.tsx";

/** The same rows as the table, as cards that fit a phone. */
export function FollowUpCards({ rows, onOpen }: { rows: FollowUp[]; onOpen: (followUp: FollowUp, targetStatus?: FollowUpStatus) => void }) {
  return (
    <ul className="flex flex-col gap-3">
      {rows.map((followUp) => (
        <li key={followUp.id} className="rounded-xl border border-line bg-surface p-4">
          <div className="flex flex-wrap items-center gap-2">
            <StatusBadge status={followUp.status} />
            {followUp.isCallback && <CallbackBadge />}
            <span className="ml-auto text-ink-soft">{formatDay(followUp.date)}</span>
          </div>
          <h3 className="mt-2 font-sans text-lg font-bold">{followUp.customerName}</h3>
          <p className="text-ink-soft">{followUp.street}</p>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="font-semibold">Reason</dt>
            <dd>{followUpReasonLabels[followUp.reason]}</dd>
            <dt className="font-semibold">Technician</dt>
            <dd>{followUp.technicianName ?? "Not assigned"}</dd>
            {followUp.isCallback && (
              <>
                <dt className="font-semibold">Cost</dt>
                <dd>
                  <CallbackCost followUp={followUp} />
                </dd>
              </>
            )}
          </dl>
          <div className="mt-3">
            <FollowUpActions followUp={followUp} onOpen={onOpen} />
          </div>
        </li>
      ))}
    </ul>
  );
}
