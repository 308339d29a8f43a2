import { Link } from "react-router-dom";
import { followUpReasonLabels, type FollowUpStatus } from "#shared/schemas/follow-ups";
import type { StaffDayVisit } from "#shared/schemas/staff-day";
import { formatCalendarDay } from "#shared/ui/index";
import { arrivalWindow, displayPhone } from "../lib/phone.ts";

const statusLabels: Record<FollowUpStatus, string> = { requested: "Requested", scheduled: "Booked", done: "Done", closed: "Closed" };
const actionClass =
  "inline-flex min-h-11 items-center justify-center rounded-lg border-2 border-pine-700 px-3 font-semibold text-pine-900 hover:bg-pine-100";

/** One follow-up visit on the day list: where, when, why, and the taps a technician needs on the road. */
export function VisitCard({ visit, showTechnician, showDate }: { visit: StaffDayVisit; showTechnician: boolean; showDate: boolean }) {
  const window = arrivalWindow(visit.arrivalStart, visit.arrivalEnd);
  return (
    <li className="flex flex-col gap-2 rounded-xl border border-line bg-surface p-4" data-testid={`day-visit-${visit.id}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h4 className="text-lg font-semibold [overflow-wrap:anywhere]">
          {visit.street}, {visit.town}
        </h4>
        {visit.overdue ? (
          <span className="rounded-md bg-rust-50 px-2 text-sm font-semibold text-rust-700">Overdue</span>
        ) : (
          <span className="rounded-md bg-canvas px-2 text-sm font-semibold text-ink-soft ring-1 ring-line">{statusLabels[visit.status]}</span>
        )}
      </div>
      <p>
        {showDate && <>{formatCalendarDay(visit.date)} · </>}
        {window ? <>Arriving {window}</> : <span className="text-ink-soft">No arrival window set</span>}
      </p>
      <p>
        <strong>{followUpReasonLabels[visit.reason]}</strong>
        {visit.reasonNote && <> — {visit.reasonNote}</>}
      </p>
      <p className="text-ink-soft">
        {visit.customerName}
        {showTechnician && <> · {visit.technicianName ? `with ${visit.technicianName}` : "no technician yet"}</>}
      </p>
      <div className="flex flex-wrap gap-2">
        {visit.phone ? (
          <>
            <a href={`tel:${visit.phone}`} className={actionClass} aria-label={`Call ${visit.customerName} at ${displayPhone(visit.phone)}`}>
              Call
            </a>
            <a href={`sms:${visit.phone}`} className={actionClass} aria-label={`Text ${visit.customerName} at ${displayPhone(visit.phone)}`}>
              Text
            </a>
          </>
        ) : (
          <span className="inline-flex min-h-11 items-center text-ink-soft">No phone number on file</span>
        )}
        {visit.planId !== null && (
          <Link to={`/plans/${visit.planId}/as-homeowner`} className={actionClass}>
            Open the plan
          </Link>
        )}
        <Link to={`/customers/${visit.customerId}`} className="inline-flex min-h-11 items-center px-1 font-semibold">
          Customer page
        </Link>
      </div>
    </li>
  );
}
