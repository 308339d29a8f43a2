import { addDays, daysBetween, isValidIsoDate, type IsoDate } from "#shared/engine/index";

/*
 * Plan dates are calendar dates in the property's zone ("YYYY-MM-DD"). To show them
 * we build the same calendar day at UTC midnight and format it in UTC, so the
 * browser's own zone can never move a step to the day before.
 */
const dayParts = new Intl.DateTimeFormat("en-US", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });
const dayPartsWithYear = new Intl.DateTimeFormat("en-US", {
  weekday: "short",
  day: "numeric",
  month: "short",
  year: "numeric",
  timeZone: "UTC",
});

function utcDate(iso: IsoDate): Date {
  const [year, month, day] = iso.split("-").map(Number) as [number, number, number];
  return new Date(Date.UTC(year, month - 1, day));
}

/** "Thu, Sep 10" (or "Thu, Sep 10, 2026" with the year): month first, as American English writes it. */
export function formatDay(iso: IsoDate, { withYear = false } = {}): string {
  if (!isValidIsoDate(iso)) return iso;
  return (withYear ? dayPartsWithYear : dayParts).format(utcDate(iso));
}

/** "Thu, Sep 10 – Fri, Nov 6"; one day when start and end are the same. */
export function formatDayRange(start: IsoDate, end: IsoDate): string {
  return start === end ? formatDay(start) : `${formatDay(start)} – ${formatDay(end)}`;
}

/** Today in the browser's zone, as the person at the screen sees the calendar. */
export function localToday(now = new Date()): IsoDate {
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** Days from the visit to the frost, or null while either date is incomplete. */
export function daysAfter(from: string, to: string): number | null {
  return isValidIsoDate(from) && isValidIsoDate(to) ? daysBetween(from, to) : null;
}

export { addDays };
