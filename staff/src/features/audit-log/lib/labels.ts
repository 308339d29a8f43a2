import { auditSubjectTypes, type AuditSubjectType } from "#shared/schemas/audit";

/** One filter choice per kind of record; typed by the shared list, so a new kind can't be left out. */
const subjectLabels: Record<AuditSubjectType, { plural: string; one: string }> = {
  plan: { plural: "Care plans", one: "Care plan" },
  visit: { plural: "Visits", one: "Visit" },
  follow_up: { plural: "Follow-up visits", one: "Follow-up" },
  question: { plural: "Questions", one: "Question" },
  customer: { plural: "Customers", one: "Customer" },
  property: { plural: "Lawns", one: "Lawn" },
  customers: { plural: "Imports", one: "Import" },
  program: { plural: "Care programs", one: "Program" },
  place: { plural: "Places", one: "Place" },
  team: { plural: "Team changes", one: "Team member" },
  unmatched_inbound: { plural: "Unmatched messages", one: "Unmatched message" },
  account: { plural: "Sign-outs everywhere", one: "Account" },
};

export const subjectTypes = auditSubjectTypes.map((value) => ({ value, label: subjectLabels[value].plural }));

export const subjectName = (type: string | null) => (type ? (subjectLabels[type as AuditSubjectType]?.one ?? type) : "");

const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });
export const formatWhen = (iso: string) => when.format(new Date(iso));
