import { wateringsOf } from "#shared/engine/waterings";

/** What a reminder says about one plan step (from plan_steps: title, and content.detail/times/minutesPerCycle). */
export type ReminderStep = {
  kind: string;
  title: string;
  detail?: string;
  times?: string[];
  minutesPerCycle?: number;
  /** On a slope: each watering in `runsPerCycle` runs of `minutesPerCycle`, `cycleStarts` each watering's first run. */
  cycleAndSoak?: { runsPerCycle: number; soakMinutes: number; cycleStarts?: string[] };
};

/** The runs of the watering that starts at `start` (just `start` on flat ground). */
export function runsOfWatering(step: ReminderStep, start: string): string[] {
  return wateringsOf(step).find((w) => w.start === start)?.runs ?? [start];
}

export type Language = "en" | "es";

const dateFormats = {
  en: new Intl.DateTimeFormat("en-US", { weekday: "short", month: "short", day: "numeric", timeZone: "UTC" }),
  es: new Intl.DateTimeFormat("es", { weekday: "short", month: "short", day: "numeric", timeZone: "UTC" }),
};

/** "Tue, Dec 1" for a plan's local date; formatted at UTC midnight so no zone can shift the day. */
export function dateLabel(localDate: string, language: Language): string {
  const [y, m, d] = localDate.split("-").map(Number) as [number, number, number];
  return dateFormats[language].format(Date.UTC(y, m - 1, d));
}

/** "7:00 am" (en) or "7:00" (es) for "07:00". */
export function timeLabel(time: string, language: Language): string {
  const [h, m] = time.split(":").map(Number) as [number, number];
  if (language === "es") return `${h}:${String(m).padStart(2, "0")}`;
  const hour12 = h % 12 === 0 ? 12 : h % 12;
  return `${hour12}:${String(m).padStart(2, "0")} ${h < 12 ? "am" : "pm"}`;
}
