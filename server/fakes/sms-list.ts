import type { RecordedSms } from "./sms-log.ts";
import { TWILIO_API_VERSION } from "./twilio-format.ts";

/*
 * GET /2010-04-01/Accounts/{sid}/Messages.json, Twilio's "list messages" with the filters the real
 * API documents: To, From, DateSent (that UTC day), DateSent> (on or after), DateSent< (on or
 * before); newest first; PageSize up to 1000. The reminder worker uses it exactly as it would use
 * Twilio after a crash or a time-out: "did a message with this text reach this number since the
 * attempt began?" before sending again. Dates are compared with the message's creation time, since
 * a freshly queued message has no sent date yet. One page only: the filters keep results small.
 */

type Query = Record<string, unknown>;

const text = (value: unknown) => (typeof value === "string" && value.trim() ? value.trim() : null);

/** "2026-12-01" covers the whole UTC day; a full ISO date-time is taken to the millisecond. */
function bound(value: string, edge: "start" | "end"): number {
  if (/^\d{4}-\d{2}-\d{2}$/.test(value)) {
    const start = Date.parse(`${value}T00:00:00Z`);
    return edge === "start" ? start : start + 86_400_000 - 1;
  }
  return Date.parse(value);
}

export function listMessages(messages: readonly RecordedSms[], accountSid: string, query: Query) {
  const to = text(query.To);
  const from = text(query.From);
  const on = text(query.DateSent);
  const after = text(query["DateSent>"]);
  const before = text(query["DateSent<"]);
  const pageSize = Math.min(1000, Math.max(1, Number(text(query.PageSize) ?? 50) || 50));
  const matches = messages
    .filter((m) => m.accountSid === accountSid)
    .filter((m) => !to || m.to === to)
    .filter((m) => !from || m.from === from)
    .filter((m) => {
      const at = Date.parse(m.dateCreated);
      if (on && (at < bound(on, "start") || at > bound(on, "end"))) return false;
      if (after && at < bound(after, "start")) return false;
      if (before && at > bound(before, "end")) return false;
      return true;
    })
    .reverse()
    .slice(0, pageSize);
  const uri = `/${TWILIO_API_VERSION}/Accounts/${accountSid}/Messages.json`;
  return { matches, page: { first_page_uri: `${uri}?PageSize=${pageSize}&Page=0`, next_page_uri: null, previous_page_uri: null, page: 0, page_size: pageSize, start: 0, end: Math.max(0, matches.length - 1), uri } };
}
