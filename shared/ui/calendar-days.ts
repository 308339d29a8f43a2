import { daysBetween, isValidIsoDate } from "#shared/engine/dates";

/*
 * Plan dates are calendar days in the property's zone ("YYYY-MM-DD"). They are shown by
 * formatting the same day at UTC midnight in UTC, so the browser's own zone never moves a
 * date to the day before.
 */
const dayFormat = new Intl.DateTimeFormat("en-US", { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" });
const dayFormatWithYear = new Intl.DateTimeFormat("en-US", { weekday: "short", day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

/** "Thu, Dec 10" (or "Thu, Dec 10, 2026"); anything that isn't a calendar date is returned as it came. */
export function formatCalendarDay(iso: string, { withYear = false } = {}): string {
  if (!isValidIsoDate(iso)) return iso;
  const [year, month, day] = iso.split("-").map(Number) as [number, number, number];
  return (withYear ? dayFormatWithYear : dayFormat).format(new Date(Date.UTC(year, month - 1, day)));
}

/** Today's calendar date in an IANA zone: the lawn's own "today", whatever the reader's clock says. */
export function todayInZone(timeZone: string, now: Date = new Date()): string {
  try {
    // en-CA writes dates as YYYY-MM-DD.
    return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(now);
  } catch {
    return new Intl.DateTimeFormat("en-CA", { year: "numeric", month: "2-digit", day: "2-digit" }).format(now);
  }
}

/** Today in the browser's zone, for date inputs the person at the screen fills in. */
export function localToday(now: Date = new Date()): string {
  return new Intl.DateTimeFormat("en-CA", { year: "numeric", month: "2-digit", day: "2-digit" }).format(now);
}

/** "today", "yesterday", "3 days ago", "tomorrow", "in 4 days". */
export function relativeDay(day: string, today: string): string {
  if (!isValidIsoDate(day) || !isValidIsoDate(today)) return day;
  const diff = daysBetween(today, day);
  if (diff === 0) return "today";
  if (diff === -1) return "yesterday";
  if (diff === 1) return "tomorrow";
  return diff < 0 ? `${-diff} days ago` : `in ${diff} days`;
}

/** How long something has waited: "12 min", "5 h", "3 days". */
export function waitingTime(since: string, now: Date = new Date()): string {
  const minutes = Math.max(0, Math.floor((now.getTime() - new Date(since).getTime()) / 60_000));
  if (Number.isNaN(minutes)) return "—";
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 48) return `${hours} h`;
  return `${Math.floor(hours / 24)} days`;
}
