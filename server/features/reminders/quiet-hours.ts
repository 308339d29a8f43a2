import { addDays } from "#shared/engine/dates";
import { allowedReminderWindow } from "#shared/schemas/preferences";
import { localMomentAt, zonedTimeToUtc } from "./schedule.ts";

/*
 * Nothing is sent before 08:00 or after 21:00 at the recipient's location (47 CFR § 64.1200(c)(1),
 * from memory; TRADE-REFERENCES.md applies it to every reminder). "Location" is the property's
 * zone: it is the only place we know for a homeowner. A company may narrow the window, never widen it.
 */

/** Inclusive wall-clock bounds, "HH:MM". */
export type SendWindow = { start: string; end: string };

export const LEGAL_WINDOW: SendWindow = { start: allowedReminderWindow.earliest, end: allowedReminderWindow.latest };

/** The legal window narrowed by the company's own setting; a setting that would leave nothing is ignored. */
export function effectiveWindow(company: { start?: string | null; end?: string | null } = {}): SendWindow {
  const start = company.start && company.start > LEGAL_WINDOW.start ? company.start : LEGAL_WINDOW.start;
  const end = company.end && company.end < LEGAL_WINDOW.end ? company.end : LEGAL_WINDOW.end;
  return start <= end ? { start, end } : LEGAL_WINDOW;
}

/** True when the recipient's wall clock is inside the window (to the minute: 21:00:59 still counts as 21:00). */
export function isInsideWindow(instant: Date, zone: string, window: SendWindow): boolean {
  const { time } = localMomentAt(instant, zone);
  return time >= window.start && time <= window.end;
}

/** The instant itself when allowed, otherwise the next opening of the window (today's or tomorrow's). */
export function nextAllowedInstant(instant: Date, zone: string, window: SendWindow): Date {
  const local = localMomentAt(instant, zone);
  if (local.time < window.start) return zonedTimeToUtc(local.date, window.start, zone);
  if (local.time > window.end) return zonedTimeToUtc(addDays(local.date, 1), window.start, zone);
  return instant;
}
