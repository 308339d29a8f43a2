import type { Place } from "#shared/schemas/place-rules";

export const MONTH_NAMES = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"] as const;
export const WEEKDAY_NAMES = ["Sunday", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"] as const;
/** Monday first, as watering schedules are usually printed. */
export const WEEK_ORDER = [1, 2, 3, 4, 5, 6, 0] as const;

/** "11-15" → "November 15". */
export function monthDayText(md: string): string {
  return `${MONTH_NAMES[Number(md.slice(0, 2)) - 1] ?? md} ${Number(md.slice(3, 5))}`;
}

export function blackoutsText(place: Pick<Place, "fertilizerBlackouts">): string {
  if (place.fertilizerBlackouts.length === 0) return "No blackout dates";
  return `No fertilizer ${place.fertilizerBlackouts.map((w) => `${monthDayText(w.from)} – ${monthDayText(w.to)}`).join("; ")}`;
}

export function phosphorusText(place: Pick<Place, "phosphorus">): string {
  return place.phosphorus === "allowed" ? "Phosphorus allowed" : "Phosphorus only for new seeding or with a soil test";
}

export function wateringText(place: Pick<Place, "watering">): string {
  const w = place.watering;
  if (!w) return "Watering any day";
  const days = WEEK_ORDER.filter((d) => w.allowedWeekdays.includes(d)).map((d) => WEEKDAY_NAMES[d]!.slice(0, 3));
  const exemption = w.newLawnExemptDays > 0 ? `; new lawns any day for ${w.newLawnExemptDays} days` : "; no new-lawn exemption";
  return `Watering only ${days.join(", ")}${exemption}`;
}

export function whereText(place: Pick<Place, "region" | "zipPrefixes">): string {
  return place.zipPrefixes.length === 0 ? `All of ${place.region}` : `${place.region}, ZIP codes starting ${place.zipPrefixes.join(", ")}`;
}
