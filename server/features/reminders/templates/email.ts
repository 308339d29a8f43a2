import { dateLabel, runsOfWatering, timeLabel, type Language, type ReminderStep } from "./wording.ts";
import { escapeHtml } from "../../../messaging/escape-html.ts";

/** Our own plain template: a heading, the day's steps, a button to the plan, and how to stop. Inline styles only (mail clients drop <style>). */

export type EmailFrame = {
  companyName: string;
  firstName: string;
  language: Language;
  planUrl: string;
  /** Page where one click stops reminder e-mails (also in the List-Unsubscribe header). */
  unsubscribeUrl: string;
};

export type ComposedEmail = { subject: string; text: string; html: string };

const words = {
  en: {
    summarySubject: (date: string, n: number) => `Your lawn today (${date}): ${n} ${n === 1 ? "task" : "tasks"}`,
    summaryHeading: (date: string) => `Your lawn today, ${date}`,
    nudgeSubject: (time: string) => `Watering time: ${time}`,
    nudgeHeading: (time: string) => `Time to water (${time})`,
    run: (minutes: number) => `Run each zone or spot for about ${minutes} minutes.`,
    runs: (runs: number, minutes: number, soak: number, times: string) =>
      `Water in ${runs} short runs of about ${minutes} minutes for each zone or spot, pausing about ${soak} minutes between runs so the water soaks in instead of running down the slope. Start each run at: ${times}.`,
    hello: (name: string) => `Hello ${name},`,
    open: "Open your care plan",
    why: (company: string) => `You get these reminders from ${company} because of your lawn care plan.`,
    stop: "Stop reminder e-mails",
  },
  es: {
    summarySubject: (date: string, n: number) => `Su césped hoy (${date}): ${n} ${n === 1 ? "tarea" : "tareas"}`,
    summaryHeading: (date: string) => `Su césped hoy, ${date}`,
    nudgeSubject: (time: string) => `Hora de regar: ${time}`,
    nudgeHeading: (time: string) => `Hora de regar (${time})`,
    run: (minutes: number) => `Riegue cada zona unos ${minutes} minutos.`,
    runs: (runs: number, minutes: number, soak: number, times: string) =>
      `Riegue en ${runs} tandas cortas de unos ${minutes} minutos por zona, con pausas de unos ${soak} minutos entre una y otra para que el agua penetre en vez de correr cuesta abajo. Empiece cada tanda a las: ${times}.`,
    hello: (name: string) => `Hola ${name}:`,
    open: "Ver su plan de cuidado",
    why: (company: string) => `Recibe estos recordatorios de ${company} por su plan de cuidado del césped.`,
    stop: "Dejar de recibir estos correos",
  },
} as const;

function render(frame: EmailFrame, subject: string, heading: string, items: { title: string; detail?: string }[]): ComposedEmail {
  const w = words[frame.language];
  const text = [
    w.hello(frame.firstName),
    "",
    heading,
    "",
    ...items.map((i) => (i.detail ? `- ${i.title}\n  ${i.detail}` : `- ${i.title}`)),
    "",
    `${w.open}: ${frame.planUrl}`,
    "",
    "--",
    w.why(frame.companyName),
    `${w.stop}: ${frame.unsubscribeUrl}`,
  ].join("\n");
  const list = items
    .map((i) => `<li style="margin:0 0 10px"><strong>${escapeHtml(i.title)}</strong>${i.detail ? `<br><span style="color:#44513f">${escapeHtml(i.detail)}</span>` : ""}</li>`)
    .join("");
  const html = `<!doctype html>
<html lang="${frame.language}"><body style="margin:0;padding:24px;background:#f6f8f3;font-family:Arial,Helvetica,sans-serif;color:#1f2a1c">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px">
<p style="margin:0 0 12px;color:#44513f">${escapeHtml(frame.companyName)}</p>
<p>${escapeHtml(w.hello(frame.firstName))}</p>
<h1 style="font-size:20px;margin:0 0 16px">${escapeHtml(heading)}</h1>
<ul style="padding-left:20px;margin:0 0 20px">${list}</ul>
<p><a href="${escapeHtml(frame.planUrl)}" style="display:inline-block;background:#2f6b2a;color:#ffffff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(w.open)}</a></p>
<hr style="border:none;border-top:1px solid #dde3d8;margin:24px 0 12px">
<p style="font-size:12px;color:#5b6656">${escapeHtml(w.why(frame.companyName))} <a href="${escapeHtml(frame.unsubscribeUrl)}" style="color:#5b6656">${escapeHtml(w.stop)}</a></p>
</div></body></html>`;
  return { subject, text, html };
}

export function dailySummaryEmail(frame: EmailFrame, localDate: string, steps: readonly ReminderStep[]): ComposedEmail {
  const w = words[frame.language];
  const date = dateLabel(localDate, frame.language);
  return render(frame, w.summarySubject(date, steps.length), w.summaryHeading(date), steps.map((s) => ({ title: s.title, detail: s.detail })));
}

export function wateringNudgeEmail(frame: EmailFrame, time: string, step: ReminderStep): ComposedEmail {
  const w = words[frame.language];
  const label = timeLabel(time, frame.language);
  const runs = runsOfWatering(step, time);
  const detail = !step.minutesPerCycle
    ? step.detail
    : step.cycleAndSoak && runs.length > 1
      ? w.runs(runs.length, step.minutesPerCycle, step.cycleAndSoak.soakMinutes, runs.map((t) => timeLabel(t, frame.language)).join(", "))
      : w.run(step.minutesPerCycle);
  return render(frame, w.nudgeSubject(label), w.nudgeHeading(label), [{ title: step.title, detail }]);
}
