import { gsm7Capacity, smsLength, toGsm7 } from "./gsm.ts";
import { dateLabel, runsOfWatering, timeLabel, type Language, type ReminderStep } from "./wording.ts";

/*
 * Reminder texts: every one starts with the company's name (CTIA sender identification), the
 * first one to a customer ends with how to stop, and all of them stay within two GSM-7 segments
 * (306 characters): the list of tasks is shortened ("+2 more") rather than the text split further.
 */

export const MAX_SMS_SEGMENTS = 2;

export type SmsFrame = {
  senderName: string;
  language: Language;
  planUrl: string;
  /** The first text to this customer: add how to stop and get help. */
  intro: boolean;
};

const words = {
  en: {
    today: (date: string) => `Your lawn today, ${date}:`,
    more: (n: number) => `+${n} more`,
    plan: "Plan:",
    intro: "Reply STOP to stop, HELP for help.",
    water: (time: string) => `Watering time (${time}).`,
    run: (minutes: number) => `Run each zone or spot about ${minutes} min.`,
    runs: (runs: number, minutes: number, soak: number, times: string) =>
      `Water in ${runs} short runs of about ${minutes} min each zone or spot, with ${soak}-min pauses so it soaks in: ${times}.`,
    done: "Reply DONE when today's watering is finished.",
  },
  es: {
    today: (date: string) => `Su cesped hoy, ${date}:`,
    more: (n: number) => `+${n} mas`,
    plan: "Plan:",
    intro: "Responda STOP para no recibir mas, HELP para ayuda.",
    water: (time: string) => `Hora de regar (${time}).`,
    run: (minutes: number) => `Riegue cada zona unos ${minutes} min.`,
    runs: (runs: number, minutes: number, soak: number, times: string) =>
      `Riegue en ${runs} tandas cortas de unos ${minutes} min por zona, con pausas de ${soak} min para que el agua penetre: ${times}.`,
    done: "Responda DONE cuando termine el riego de hoy.",
  },
} as const;

const budget = gsm7Capacity(MAX_SMS_SEGMENTS);
const fits = (text: string) => smsLength(text).segments <= MAX_SMS_SEGMENTS;

/** Last resort for absurdly long company names or links: cut to the budget. */
function hardTrim(text: string): string {
  let out = text;
  while (!fits(out)) out = out.slice(0, Math.max(0, Math.min(out.length - 1, budget - 3))) + "...";
  return out;
}

function assemble(frame: SmsFrame, middle: string): string {
  const w = words[frame.language];
  const parts = [`${frame.senderName}:`, middle, `${w.plan} ${frame.planUrl}`];
  if (frame.intro) parts.push(w.intro);
  return toGsm7(parts.filter(Boolean).join(" "));
}

/** "Company: Your lawn today, Tue, Dec 1: Water 3 times; Mow to 3.5 in. Plan: https://… [Reply STOP…]" */
export function dailySummarySms(frame: SmsFrame, localDate: string, steps: readonly ReminderStep[]): string {
  const w = words[frame.language];
  const titles = steps.map((s) => s.title.trim().replace(/[.\s]+$/, ""));
  for (let shown = titles.length; shown >= 0; shown--) {
    const hidden = titles.length - shown;
    const list = [...titles.slice(0, shown), ...(hidden > 0 ? [w.more(hidden)] : [])].join("; ");
    const text = assemble(frame, `${w.today(dateLabel(localDate, frame.language))} ${list}.`);
    if (fits(text)) return text;
  }
  return hardTrim(assemble(frame, w.today(dateLabel(localDate, frame.language))));
}

/**
 * "Company: Watering time (7:00 am). Run each zone or spot about 6 min. Reply DONE when … Plan: https://…"
 * On a slope one text per watering, naming its short runs, rather than one per run.
 */
export function wateringNudgeSms(frame: SmsFrame, time: string, step: ReminderStep): string {
  const w = words[frame.language];
  const runs = runsOfWatering(step, time);
  const amount = !step.minutesPerCycle
    ? ""
    : step.cycleAndSoak && runs.length > 1
      ? w.runs(runs.length, step.minutesPerCycle, step.cycleAndSoak.soakMinutes, runs.map((t) => timeLabel(t, frame.language)).join(", "))
      : w.run(step.minutesPerCycle);
  const middle = [w.water(timeLabel(time, frame.language)), amount, w.done].filter(Boolean).join(" ");
  const text = assemble(frame, middle);
  return fits(text) ? text : hardTrim(text);
}
