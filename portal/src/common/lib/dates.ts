/**
 * Plan dates are local calendar dates of the lawn ("2026-11-03"), not instants. Parsing them
 * with `new Date("2026-11-03")` means UTC midnight, which shows as the day before west of
 * Greenwich; so every date here is built and formatted in UTC on purpose.
 */
export type IsoDate = string;

function utcDate(iso: IsoDate): Date {
  const [year, month, day] = iso.split("-").map(Number) as [number, number, number];
  return new Date(Date.UTC(year, month - 1, day));
}

/** The locale that writes dates the way our homeowners read them: month first in American English ("Nov 3"), "3 nov" in Spanish. */
function dateLocale(language: string): string {
  return language.startsWith("es") ? "es-US" : "en-US";
}

/**
 * Making an Intl.DateTimeFormat costs far more than using one, and a screen formats dozens of
 * dates (the whole plan, hundreds): each locale and style is made once and kept.
 */
const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale}|${JSON.stringify(options)}`;
  let made = formatters.get(key);
  if (!made) {
    made = new Intl.DateTimeFormat(locale, options);
    formatters.set(key, made);
  }
  return made;
}

/** "Nov 3" ("3 nov" in Spanish) */
export function formatShortDate(iso: IsoDate, language: string): string {
  return formatter(dateLocale(language), { day: "numeric", month: "short", timeZone: "UTC" }).format(utcDate(iso));
}

/** "Tue, Nov 3" ("mar, 3 nov" in Spanish) */
export function formatDayWithWeekday(iso: IsoDate, language: string): string {
  return formatter(dateLocale(language), { weekday: "short", day: "numeric", month: "short", timeZone: "UTC" }).format(utcDate(iso));
}

/** "Tuesday, November 3" ("martes, 3 de noviembre" in Spanish) */
export function formatLongDate(iso: IsoDate, language: string): string {
  return formatter(dateLocale(language), { weekday: "long", day: "numeric", month: "long", timeZone: "UTC" }).format(utcDate(iso));
}

/** Whole days from `from` to `to` (negative when `to` is earlier). */
export function daysBetween(from: IsoDate, to: IsoDate): number {
  return Math.round((utcDate(to).getTime() - utcDate(from).getTime()) / 86_400_000);
}

/** Today's date on the lawn, in its own time zone (en-CA formats as YYYY-MM-DD). */
export function localDateIn(timeZone: string, now = new Date()): IsoDate {
  return formatter("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(now);
}

/**
 * "07:00" → "7 am", "16:30" → "4:30 pm" in English; Spanish readers get "7 a. m." from Intl.
 * A wall-clock time has no zone, so it is formatted as a UTC time on a fixed day.
 */
export function formatClock(hhmm: string, language: string): string {
  const [hours, minutes] = hhmm.split(":").map(Number) as [number, number];
  if (!language.startsWith("es")) {
    const suffix = hours < 12 ? "am" : "pm";
    const hour12 = hours % 12 === 0 ? 12 : hours % 12;
    return minutes === 0 ? `${hour12} ${suffix}` : `${hour12}:${String(minutes).padStart(2, "0")} ${suffix}`;
  }
  const at = new Date(Date.UTC(2000, 0, 1, hours, minutes));
  return formatter("es-US", { hour: "numeric", minute: minutes === 0 ? undefined : "2-digit", timeZone: "UTC" }).format(at);
}

/** A moment ("2026-12-01T14:05:00Z") as local clock and date for "saved at …" lines. */
export function formatMoment(timestamp: number | string, language: string): string {
  return formatter(language.startsWith("es") ? "es-US" : "en-US", { dateStyle: "medium", timeStyle: "short" }).format(new Date(timestamp));
}
