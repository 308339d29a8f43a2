import twilio from "twilio";
import { toGsm7 } from "../reminders/templates/gsm.ts";

/** Replies to keywords: each names the company (CTIA) and fits one or two GSM-7 segments. */
export const replies = {
  stop: (sender: string) => `${sender}: You're unsubscribed from text reminders and will get no more texts from us. Reply START to resume.`,
  start: (sender: string) => `${sender}: Text reminders are back on. Reply HELP for help, STOP to stop.`,
  help: (sender: string, company: string) => `${sender}: lawn care plan reminders from ${company}. Reply STOP to stop, START to resume. Msg & data rates may apply.`,
  done: (sender: string, count: number) =>
    count > 0 ? `${sender}: Marked today's watering done. Nice work!` : `${sender}: There is no watering left to mark for today.`,
};

/** TwiML with one <Message> per text (none: an empty <Response/>, which sends nothing). */
export function twimlReply(...texts: string[]): string {
  const response = new twilio.twiml.MessagingResponse();
  for (const text of texts) response.message(toGsm7(text));
  return response.toString();
}
