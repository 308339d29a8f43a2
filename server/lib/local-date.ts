/**
 * Today's calendar date at a place, as YYYY-MM-DD. The care-plan engine never reads
 * the clock; the server does it here, in the lawn's own time zone.
 */
export function localDateAt(timeZone: string, now: Date = new Date()): string {
  // en-CA formats as YYYY-MM-DD.
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(now);
}
