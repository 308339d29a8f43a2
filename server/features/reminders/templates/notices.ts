import { escapeHtml } from "../../../messaging/escape-html.ts";
import { gsm7Capacity, smsLength, toGsm7 } from "./gsm.ts";
import { MAX_SMS_SEGMENTS } from "./sms.ts";
import { dateLabel, timeLabel, type Language } from "./wording.ts";

/*
 * Texts of notices: messages caused by someone's action rather than by the plan's calendar. Like
 * reminders they name the company first, stay within two GSM-7 segments (quotes are shortened,
 * never the link), and e-mails come as HTML and plain text. The link always leads straight to
 * what the notice is about.
 */

export type NoticeFrame = {
  senderName: string;
  companyName: string;
  /** The office's number (E.164) when the company set one. */
  companyPhone: string | null;
  /** Absolute URL of the company's logo when it has one (e-mail only). */
  logoUrl: string | null;
  firstName: string;
  language: Language;
  link: string;
  unsubscribeUrl: string;
  /** The first text to this customer: add how to stop. */
  intro: boolean;
};

export type StaffMessage = { authorName: string; text: string };
export type VisitChange = "booked" | "moved" | "cancelled" | "done";
export type VisitFacts = {
  change: VisitChange;
  date: string | null;
  arrivalStart: string | null;
  arrivalEnd: string | null;
  technicianName: string | null;
  reason: string;
  customerPrep: string | null;
  workDone: string | null;
};
export type UpcomingStep = { date: string; title: string };
export type ComposedNotice = { subject: string | null; body: string; html: string | null };

const reasons: Record<Language, Record<string, string>> = {
  en: {
    no_germination: "seed that has not come up",
    washed_out: "seed washed out by rain",
    mowed_too_early: "grass mowed too early",
    herbicide_applied: "a weed killer applied too soon",
    poor_seed_soil_contact: "seed not reaching the soil",
    under_watering: "too little water",
    over_watering: "too much water",
    disease: "signs of disease",
    pest_damage: "pest damage",
    other: "a check of your lawn",
  },
  es: {
    no_germination: "semilla que no ha brotado",
    washed_out: "semilla arrastrada por la lluvia",
    mowed_too_early: "césped cortado demasiado pronto",
    herbicide_applied: "herbicida aplicado demasiado pronto",
    poor_seed_soil_contact: "semilla sin contacto con la tierra",
    under_watering: "falta de riego",
    over_watering: "exceso de riego",
    disease: "señales de enfermedad",
    pest_damage: "daño por plagas",
    other: "una revisión de su césped",
  },
};

export const reasonLabel = (reason: string, language: Language) => reasons[language][reason] ?? reasons[language].other!;

/** "+15555550123" → "(555) 555-0123"; other numbers as stored. */
export function phoneLabel(e164: string): string {
  const us = /^\+1(\d{3})(\d{3})(\d{4})$/.exec(e164);
  return us ? `(${us[1]}) ${us[2]}-${us[3]}` : e164;
}

const words = {
  en: {
    answered: (who: string) => `${who} answered your question:`,
    answeredMany: (n: number) => `${n} new replies to your question. Latest:`,
    read: "Read it:",
    readAll: "Read them all",
    readOne: "Read the answer",
    answerSubject: (company: string) => `${company} answered your question`,
    answerHeading: (n: number) => (n === 1 ? "You have a new reply" : `You have ${n} new replies`),
    visit: {
      booked: "A visit is booked",
      moved: "Your visit has moved",
      cancelled: "Your visit is cancelled",
      done: "Your visit is done",
    } satisfies Record<VisitChange, string>,
    on: (date: string) => `on ${date}`,
    between: (from: string, to: string) => `between ${from} and ${to}`,
    who: (name: string) => `${name} is coming`,
    forReason: (reason: string) => `About: ${reason}.`,
    prep: (text: string) => `Before the visit: ${text}`,
    workDone: (text: string) => `What we did: ${text}`,
    details: "Details:",
    openVisit: "See it in your plan",
    welcomeSms: "Your lawn care plan is ready. Next days:",
    welcomeOpen: "Open it (link works once):",
    welcomeSubject: (company: string) => `Your lawn care plan from ${company}`,
    welcomeHeading: "Your lawn care plan is ready",
    welcomeLead: (company: string) => `${company} has made a day-by-day plan for your lawn: when to water, when to mow, and what to keep off the new grass.`,
    welcomeNext: "The next few days",
    welcomeButton: "Open your care plan",
    welcomeOnce: (days: number) => `The button signs you in. It works once and for ${days} days; after that, ask for a new link on the sign-in page.`,
    office: (phone: string) => `Call or text the office at ${phone}.`,
    officeSms: (phone: string) => `Office: ${phone}`,
    hello: (name: string) => `Hello ${name},`,
    replyHint: "You can also reply to this e-mail.",
    why: (company: string) => `You get these messages from ${company} because of your lawn care plan.`,
    stop: "Stop e-mails",
    intro: "Reply STOP to stop, HELP for help.",
  },
  es: {
    answered: (who: string) => `${who} respondio su pregunta:`,
    answeredMany: (n: number) => `${n} respuestas nuevas a su pregunta. La ultima:`,
    read: "Leer:",
    readAll: "Leer todas",
    readOne: "Leer la respuesta",
    answerSubject: (company: string) => `${company} respondió su pregunta`,
    answerHeading: (n: number) => (n === 1 ? "Tiene una respuesta nueva" : `Tiene ${n} respuestas nuevas`),
    visit: {
      booked: "Visita programada",
      moved: "Su visita cambió de fecha",
      cancelled: "Su visita fue cancelada",
      done: "Su visita se realizó",
    } satisfies Record<VisitChange, string>,
    on: (date: string) => `el ${date}`,
    between: (from: string, to: string) => `entre las ${from} y las ${to}`,
    who: (name: string) => `Viene ${name}`,
    forReason: (reason: string) => `Motivo: ${reason}.`,
    prep: (text: string) => `Antes de la visita: ${text}`,
    workDone: (text: string) => `Lo que hicimos: ${text}`,
    details: "Detalles:",
    openVisit: "Verla en su plan",
    welcomeSms: "Su plan de cuidado del cesped esta listo. Proximos dias:",
    welcomeOpen: "Abralo (el enlace sirve una vez):",
    welcomeSubject: (company: string) => `Su plan de cuidado del césped de ${company}`,
    welcomeHeading: "Su plan de cuidado del césped está listo",
    welcomeLead: (company: string) => `${company} preparó un plan día a día para su césped: cuándo regar, cuándo cortar y qué evitar sobre el césped nuevo.`,
    welcomeNext: "Los próximos días",
    welcomeButton: "Abrir su plan",
    welcomeOnce: (days: number) => `El botón inicia su sesión. Sirve una vez y durante ${days} días; después, pida un enlace nuevo en la página de inicio de sesión.`,
    office: (phone: string) => `Llame o escriba a la oficina al ${phone}.`,
    officeSms: (phone: string) => `Oficina: ${phone}`,
    hello: (name: string) => `Hola ${name}:`,
    replyHint: "También puede responder a este correo.",
    why: (company: string) => `Recibe estos mensajes de ${company} por su plan de cuidado del césped.`,
    stop: "Dejar de recibir correos",
    intro: "Responda STOP para no recibir mas, HELP para ayuda.",
  },
} as const;

const fits = (text: string) => smsLength(text).segments <= MAX_SMS_SEGMENTS;
const budget = gsm7Capacity(MAX_SMS_SEGMENTS);
const oneLine = (text: string) => text.replace(/\s+/g, " ").trim();

/**
 * "Sender: <head> "<quote>" <tail> <link> [office] [intro]": the quote is shortened word by word
 * until the whole text fits; the sender, the link and the stop words are never cut.
 */
function smsWithQuote(frame: NoticeFrame, head: string, quote: string, tail: string, marks = true): string {
  const w = words[frame.language];
  const build = (q: string) =>
    toGsm7(
      [`${frame.senderName}:`, head, q ? (marks ? `"${q}"` : q) : "", tail, frame.link, frame.companyPhone ? w.officeSms(phoneLabel(frame.companyPhone)) : "", frame.intro ? w.intro : ""]
        .filter(Boolean)
        .join(" "),
    );
  const full = oneLine(quote);
  if (fits(build(full))) return build(full);
  const wordsOfQuote = full.split(" ");
  for (let n = wordsOfQuote.length - 1; n > 0; n--) {
    const text = build(`${wordsOfQuote.slice(0, n).join(" ")}...`);
    if (fits(text)) return text;
  }
  const bare = build("");
  return fits(bare) ? bare : bare.slice(0, budget);
}

function emailShell(frame: NoticeFrame, heading: string, bodyHtml: string, button: string): string {
  const w = words[frame.language];
  const logo = frame.logoUrl
    ? `<img src="${escapeHtml(frame.logoUrl)}" alt="${escapeHtml(frame.companyName)}" style="max-height:48px;max-width:200px;display:block;margin:0 0 12px">`
    : `<p style="margin:0 0 12px;color:#44513f">${escapeHtml(frame.companyName)}</p>`;
  const office = frame.companyPhone
    ? `<p style="margin:16px 0 0">${escapeHtml(w.office(phoneLabel(frame.companyPhone)))}</p>`
    : "";
  return `<!doctype html>
<html lang="${frame.language}"><body style="margin:0;padding:24px;background:#f6f8f3;font-family:Arial,Helvetica,sans-serif;color:#1f2a1c">
<div style="max-width:560px;margin:0 auto;background:#ffffff;border-radius:8px;padding:24px">
${logo}
<p>${escapeHtml(w.hello(frame.firstName))}</p>
<h1 style="font-size:20px;margin:0 0 16px">${escapeHtml(heading)}</h1>
${bodyHtml}
<p><a href="${escapeHtml(frame.link)}" style="display:inline-block;background:#2f6b2a;color:#ffffff;padding:10px 16px;border-radius:6px;text-decoration:none">${escapeHtml(button)}</a></p>
${office}
<hr style="border:none;border-top:1px solid #dde3d8;margin:24px 0 12px">
<p style="font-size:12px;color:#5b6656">${escapeHtml(w.replyHint)} ${escapeHtml(w.why(frame.companyName))} <a href="${escapeHtml(frame.unsubscribeUrl)}" style="color:#5b6656">${escapeHtml(w.stop)}</a></p>
</div></body></html>`;
}

function emailText(frame: NoticeFrame, heading: string, lines: string[], button: string): string {
  const w = words[frame.language];
  return [
    w.hello(frame.firstName),
    "",
    heading,
    "",
    ...lines,
    "",
    `${button}: ${frame.link}`,
    ...(frame.companyPhone ? ["", w.office(phoneLabel(frame.companyPhone))] : []),
    "",
    "--",
    w.replyHint,
    w.why(frame.companyName),
    `${w.stop}: ${frame.unsubscribeUrl}`,
  ].join("\n");
}

const paragraphs = (lines: string[]) => lines.map((l) => `<p style="margin:0 0 12px">${escapeHtml(l).replace(/\n/g, "<br>")}</p>`).join("\n");

/** Staff messages the homeowner has not read yet, oldest first; several make one message. */
export function conversationUpdate(frame: NoticeFrame, channel: "sms" | "email", messages: readonly StaffMessage[]): ComposedNotice {
  const w = words[frame.language];
  const latest = messages[messages.length - 1]!;
  if (channel === "sms") {
    const head = messages.length === 1 ? w.answered(latest.authorName) : w.answeredMany(messages.length);
    return { subject: null, body: smsWithQuote(frame, head, latest.text, w.read), html: null };
  }
  const heading = w.answerHeading(messages.length);
  const button = messages.length === 1 ? w.readOne : w.readAll;
  const text = emailText(frame, heading, messages.map((m) => `${m.authorName}:\n${m.text}\n`), button);
  const quoted = messages
    .map(
      (m) =>
        `<div style="margin:0 0 12px;padding:8px 12px;border-left:3px solid #2f6b2a;background:#f6f8f3"><strong>${escapeHtml(m.authorName)}</strong><br>${escapeHtml(m.text).replace(/\n/g, "<br>")}</div>`,
    )
    .join("\n");
  return { subject: w.answerSubject(frame.companyName), body: text, html: emailShell(frame, heading, quoted, button) };
}

function visitLines(frame: NoticeFrame, visit: VisitFacts): { when: string; lines: string[] } {
  const w = words[frame.language];
  const when = [
    visit.date ? w.on(dateLabel(visit.date, frame.language)) : "",
    visit.arrivalStart && visit.arrivalEnd ? w.between(timeLabel(visit.arrivalStart, frame.language), timeLabel(visit.arrivalEnd, frame.language)) : "",
  ]
    .filter(Boolean)
    .join(" ");
  const lines = [
    visit.change !== "cancelled" && visit.change !== "done" && visit.technicianName ? `${w.who(visit.technicianName)}.` : "",
    w.forReason(reasonLabel(visit.reason, frame.language)),
    visit.change !== "cancelled" && visit.change !== "done" && visit.customerPrep ? w.prep(oneLine(visit.customerPrep)) : "",
    visit.change === "done" && visit.workDone ? w.workDone(oneLine(visit.workDone)) : "",
  ].filter(Boolean);
  return { when, lines };
}

/** A follow-up visit booked, moved, cancelled or done: when, who, why and what to do before it. */
export function visitUpdate(frame: NoticeFrame, channel: "sms" | "email", visit: VisitFacts): ComposedNotice {
  const w = words[frame.language];
  const { when, lines } = visitLines(frame, visit);
  const heading = [w.visit[visit.change], when].filter(Boolean).join(" ");
  if (channel === "sms") {
    // What to do before the visit (or what was done) is the free text worth shortening; the rest is short and fixed.
    const free = lines.find((l) => l.startsWith(w.prep("")) || l.startsWith(w.workDone(""))) ?? "";
    const head = [`${heading}.`, ...lines.filter((l) => l !== free)].join(" ");
    return { subject: null, body: smsWithQuote(frame, head, free, w.details, false), html: null };
  }
  const text = emailText(frame, heading, lines, w.openVisit);
  return { subject: `${w.visit[visit.change]}: ${frame.companyName}`, body: text, html: emailShell(frame, heading, paragraphs(lines), w.openVisit) };
}

/** The first message of a plan: who it is from, a one-tap sign-in link, and what the next days hold. */
export function welcome(frame: NoticeFrame, channel: "sms" | "email", steps: readonly UpcomingStep[], linkDays: number): ComposedNotice {
  const w = words[frame.language];
  if (channel === "sms") {
    const titles = steps.map((s) => s.title.trim().replace(/[.\s]+$/, ""));
    for (let shown = Math.min(titles.length, 3); shown >= 0; shown--) {
      const list = titles.slice(0, shown).join("; ");
      const text = smsWithQuote(frame, shown > 0 ? `${w.welcomeSms} ${list}.` : w.welcomeHeading + ".", "", w.welcomeOpen);
      if (text.includes(frame.link)) return { subject: null, body: text, html: null };
    }
    return { subject: null, body: smsWithQuote(frame, `${w.welcomeHeading}.`, "", w.welcomeOpen), html: null };
  }
  const items = steps.map((s) => `${dateLabel(s.date, frame.language)}: ${s.title}`);
  const lines = [w.welcomeLead(frame.companyName), ...(items.length > 0 ? [`${w.welcomeNext}:`, ...items.map((i) => `- ${i}`)] : []), w.welcomeOnce(linkDays)];
  const list = items.length > 0 ? `<p style="margin:0 0 8px"><strong>${escapeHtml(w.welcomeNext)}</strong></p><ul style="padding-left:20px;margin:0 0 16px">${items.map((i) => `<li>${escapeHtml(i)}</li>`).join("")}</ul>` : "";
  const html = emailShell(frame, w.welcomeHeading, `${paragraphs([w.welcomeLead(frame.companyName)])}\n${list}\n${paragraphs([w.welcomeOnce(linkDays)])}`, w.welcomeButton);
  return { subject: w.welcomeSubject(frame.companyName), body: emailText(frame, w.welcomeHeading, lines, w.welcomeButton), html };
}
