/** Audit actions in words; an action added later shows as its code rather than disappearing. */
const actionLabels: Record<string, string> = {
  "plan.read": "Opened a care plan",
  "plan.regenerated": "Regenerated a care plan",
  "plan.step_state_changed": "Changed a step's state",
  "plan.observation_added": "Recorded an observation",
  "plan.question_answered": "Answered a question",
  "plan.thread_read": "Read a question thread",
  "customer.read": "Opened a customer",
  "customers.imported": "Imported visits from a file",
  "property.read": "Opened a lawn",
  "visit.moved": "Moved a visit",
  "follow_up.created": "Booked a follow-up visit",
  "follow_up.updated": "Changed a follow-up visit",
  "unmatched_inbound.read": "Read the unmatched messages",
  "unmatched_inbound.handled": "Marked an unmatched message handled",
  "place.created": "Added a place's rules",
  "place.updated": "Changed a place's rules",
  "place.deleted": "Deleted a place's rules",
};
export const actionLabel = (action: string) => actionLabels[action] ?? action;

export const subjectTypes = [
  { value: "plan", label: "Care plans" },
  { value: "customer", label: "Customers" },
  { value: "property", label: "Lawns" },
  { value: "visit", label: "Visits" },
  { value: "follow_up", label: "Follow-up visits" },
  { value: "customers", label: "Imports" },
  { value: "place", label: "Places" },
];
const subjectNames: Record<string, string> = { plan: "Care plan", customer: "Customer", property: "Lawn", visit: "Visit", follow_up: "Follow-up", customers: "Import", place: "Place" };
export const subjectName = (type: string | null) => (type ? (subjectNames[type] ?? type) : "");

const when = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });
export const formatWhen = (iso: string) => when.format(new Date(iso));
