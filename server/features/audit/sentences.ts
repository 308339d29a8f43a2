import type { AuditRow } from "./repo.ts";

type Words = { name?: string; role?: string; created?: number; total?: number };

/** What each action did, as the middle of a sentence; `{name}` etc. come from the entry. */
const doneWords: Record<string, (w: Words) => string> = {
  "plan.read": () => "opened the care plan",
  "plan.regenerated": () => "remade the care plan",
  "plan.step_state_changed": () => "marked a step of the care plan",
  "plan.observation_added": () => "recorded what they saw on the care plan",
  "plan.question_answered": () => "answered a question",
  "plan.thread_read": () => "read the questions and answers",
  "question.assigned": () => "assigned a question",
  "customer.read": () => "opened the customer record",
  "property.read": () => "opened the lawn's record",
  "visit.logged": () => "logged a visit",
  "visit.moved": () => "changed a visit",
  "follow_up.created": () => "booked a follow-up visit",
  "follow_up.updated": () => "changed a follow-up visit",
  "customers.imported": (w) =>
    w.created === undefined ? "imported visits from a file" : `imported ${w.created} of ${w.total ?? w.created} ${w.total === 1 ? "visit" : "visits"} from a file`,
  "program.saved": () => "saved the care-plan program",
  "place.created": (w) => `added the place ${w.name ?? ""}`.trim(),
  "place.updated": (w) => `changed the rules of ${w.name ?? "a place since deleted"}`,
  "place.deleted": (w) => `deleted the place ${w.name ?? ""}`.trim(),
  "team.invited": (w) => `invited ${w.name ?? "someone"} to the team${w.role ? ` as ${roleWord(w.role)}` : ""}`,
  "team.role_changed": (w) => `made ${w.name ?? "a team member"} ${w.role ? roleWord(w.role) : "a new role"}`,
  "team.deactivated": (w) => `deactivated ${w.name ?? "a team member"}'s account`,
  "unmatched_inbound.read": () => "read the unmatched messages",
  "unmatched_inbound.handled": () => "dealt with an unmatched message",
  "account.signed_out_everywhere": () => "signed out on every device",
};

const roleWord = (role: string) => (role === "manager" ? "a manager" : role === "technician" ? "a technician" : role);

/** A place or team member is named as it is now; a deleted place by the name it had (detail.name). */
function wordsOf(row: AuditRow): Words {
  const d = row.detail ?? {};
  return { name: row.subject_name ?? d.name, role: d.role, created: d.created, total: d.total };
}

/**
 * "Marco Ibsen logged a visit for Hana Sørbye, 19 Cobble Row": who, what and for whom, for a
 * manager reading the log. An action without words yet still says who and which record.
 */
export function auditSentence(row: AuditRow): string {
  const who = row.actor_name ?? "Someone no longer on file";
  const words = doneWords[row.action];
  const what = words ? words(wordsOf(row)) : `did "${row.action}"${row.subject_id ? ` on record ${row.subject_id}` : ""}`;
  const forWhom = row.customer_name ? ` for ${row.customer_name}${row.street ? `, ${row.street}` : ""}` : "";
  return `${who} ${what}${forWhom}`;
}
