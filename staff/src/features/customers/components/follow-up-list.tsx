import { followUpReasonLabels, type FollowUp } from "#shared/schemas/follow-ups";
import { formatCalendarDay } from "#shared/ui/index";

const statusLabels: Record<FollowUp["status"], string> = { requested: "Requested", scheduled: "Scheduled", done: "Done", closed: "Closed" };

/** Return visits on this customer's lawns and why they were needed. */
export function FollowUpList({ followUps }: { followUps: FollowUp[] }) {
  return (
    <ul className="flex flex-col gap-3">
      {followUps.map((f) => (
        <li key={f.id} className="rounded-xl border border-line bg-surface p-4">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <p className="font-semibold">
              {followUpReasonLabels[f.reason]}
              {f.isCallback && <span className="ml-2 rounded-md bg-rust-50 px-2 text-sm text-rust-700">Callback</span>}
            </p>
            <span className="rounded-md bg-pine-100 px-2 text-sm font-semibold text-pine-900">{statusLabels[f.status]}</span>
          </div>
          <p>
            {f.scheduledFor ? formatCalendarDay(f.scheduledFor, { withYear: true }) : "No date yet"} · {f.technicianName ?? "not assigned yet"} · {f.street}
          </p>
          {f.reasonNote && <p className="text-base text-ink-soft whitespace-pre-line">{f.reasonNote}</p>}
        </li>
      ))}
    </ul>
  );
}
