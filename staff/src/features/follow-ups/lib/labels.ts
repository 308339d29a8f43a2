import {
  FOLLOW_UP_OUTCOMES,
  FOLLOW_UP_REASONS,
  FOLLOW_UP_STATUSES,
  followUpReasonLabels,
  type FollowUpOutcome,
  type FollowUpStatus,
} from "#shared/schemas/follow-ups";

export const statusLabels: Record<FollowUpStatus, string> = {
  requested: "Requested",
  scheduled: "Scheduled",
  done: "Done",
  closed: "Closed",
};

/** What moving to a status means, for the action buttons. */
export const moveLabels: Record<FollowUpStatus, string> = {
  requested: "Back to requested",
  scheduled: "Schedule",
  done: "Mark done",
  closed: "Close",
};

export const outcomeLabels: Record<FollowUpOutcome, string> = {
  resolved: "Resolved",
  partly_resolved: "Partly resolved",
  not_resolved: "Not resolved",
  pending: "Not known yet",
};

export const statusOptions = FOLLOW_UP_STATUSES.map((value) => ({ value, label: statusLabels[value] }));
export const reasonOptions = FOLLOW_UP_REASONS.map((value) => ({ value, label: followUpReasonLabels[value] }));
export const outcomeOptions = FOLLOW_UP_OUTCOMES.map((value) => ({ value, label: outcomeLabels[value] }));

const dateFormat = new Intl.DateTimeFormat("en-US", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** "Sep 12, 2026" for an ISO date, read as a calendar day (not shifted by the browser's zone). */
export function formatDay(isoDate: string): string {
  return dateFormat.format(new Date(`${isoDate.slice(0, 10)}T00:00:00Z`));
}

const money = new Intl.NumberFormat(undefined, { style: "currency", currency: "USD" });
export const formatMoney = (value: number) => money.format(value);

export const formatHours = (value: number) => `${value.toLocaleString(undefined, { maximumFractionDigits: 2 })} h`;
