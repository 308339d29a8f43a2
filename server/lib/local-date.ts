/**
 * Today's calendar date at a place, as YYYY-MM-DD. The care-plan engine never reads
 * the clock; the server does it here, in the lawn's own time zone.
 */
export function localDateAt(timeZone: string, now: Date = new Date()): string {
  return dateFormatFor(timeZone).format(now);
}

// Building an Intl.DateTimeFormat costs far more than formatting with one, and the busiest
// requests ask for the same few zones again and again.
const formats = new Map<string, Intl.DateTimeFormat>();

function dateFormatFor(timeZone: string): Intl.DateTimeFormat {
  let format = formats.get(timeZone);
  if (!format) {
    // en-CA formats as YYYY-MM-DD. Built before caching, so an unknown zone throws and is not kept.
    format = new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" });
    formats.set(timeZone, format);
  }
  return format;
}
