import twilio from "twilio";
import { toGsm7 } from "../reminders/templates/gsm.ts";

/** Replies to keywords: each names the company (CTIA) and fits one or two GSM-7 segments. */
export const replies = {
  stop: (sender: string) => `${sender}: You're unsubscribed from text reminders and will get no more texts from us. Reply START to resume.`,
  start: (sender: string) => `${sender}: Text reminders are back on. Reply HELP for help, STOP to stop.`,
  help: (sender: string, company: string) => `${sender}: lawn care plan reminders from ${company}. Reply STOP to stop, START to resume. Msg & data rates may apply.`,
  done: (sender: string, count: number) =>
    count > 0 ? `${sender}: Marked today's watering done. Nice work!` : `${sender}: There is no watering left to mark for today.`,
  received: (sender: string, photos: number) =>
    `${sender}: Thanks, we got your message${photos === 0 ? "" : photos === 1 ? " and photo" : " and photos"}. A technician will answer you here.`,
  photoRefused: (sender: string, kept: boolean, reasons: readonly string[]) =>
    `${sender}: ${kept ? "We got your message, but not" : "We couldn't take"} ${reasons.length === 1 ? "your photo" : "some of your photos"}: ${[...new Set(reasons)].join("; ")}. Please try again with a regular camera photo (JPEG or PNG).`,
  unknownNumber: (sender: string, company: string, phone: string | null) =>
    `${sender}: Hello! This number isn't on file with ${company}, so we couldn't pass your text on. ${phone ? `Please call or text us at ${formatPhone(phone)}.` : "Please contact our office directly."}`,
  noActivePlan: (sender: string, phone: string | null) =>
    `${sender}: Thanks for your text. You have no active lawn plan with us right now, so it can't go to a technician. ${phone ? `Please call us at ${formatPhone(phone)}.` : "Please contact our office directly."}`,
};

/** Why one photo of a text was refused, in a few words for the reply. */
export const photoRefusalReasons = {
  unreachable: "we couldn't download it",
  too_large: "it is larger than 15 MB",
  not_allowed: "we couldn't download it",
  unsupported_type: "it isn't a photo we can open",
  image_contains_code: "it carries more than a photo",
  invalid_image: "it looks damaged",
  image_too_large: "it has too many pixels",
  too_many: "we take at most 6 photos per text",
} as const;

/** +1 numbers as Americans write them; any other E.164 number as it is. */
export function formatPhone(e164: string): string {
  const us = /^\+1(\d{3})(\d{3})(\d{4})$/.exec(e164);
  return us ? `(${us[1]}) ${us[2]}-${us[3]}` : e164;
}

/** TwiML with one <Message> per text (none: an empty <Response/>, which sends nothing). */
export function twimlReply(...texts: string[]): string {
  const response = new twilio.twiml.MessagingResponse();
  for (const text of texts) response.message(toGsm7(text));
  return response.toString();
}
