import { createFollowUpSchema, type CreateFollowUp } from "#shared/schemas/follow-ups";

/** What the booking form holds: text as typed, turned into the API's body on submit. */
export interface FollowUpFormValues {
  reason: string;
  reasonNote: string;
  scheduledFor: string;
  technicianId: string;
  isCallback: boolean;
  arrivalStart: string;
  arrivalEnd: string;
  customerPrep: string;
}

export const emptyFollowUpForm: FollowUpFormValues = {
  reason: "", reasonNote: "", scheduledFor: "", technicianId: "", isCallback: false, arrivalStart: "", arrivalEnd: "", customerPrep: "",
};

export const followUpFormFields = ["reason", "reasonNote", "scheduledFor", "technicianId", "isCallback", "arrivalStart", "arrivalEnd", "customerPrep"] as const;

export interface FollowUpContext {
  propertyId: number;
  planId: number;
  questionMessageId: number | undefined;
}

type Checked = { ok: true; body: CreateFollowUp } | { ok: false; fields: Partial<Record<keyof FollowUpFormValues, string>> };

/** Checks the form with the API's own schema, so the messages match what the server would say. */
export function toFollowUpBody(values: FollowUpFormValues, context: FollowUpContext): Checked {
  const raw = {
    ...context,
    reason: values.reason,
    reasonNote: values.reasonNote.trim() || undefined,
    scheduledFor: values.scheduledFor || undefined,
    technicianId: values.technicianId ? Number(values.technicianId) : undefined,
    isCallback: values.isCallback,
    // A time input may carry seconds ("09:00:00") in some browsers; the API takes HH:MM.
    arrivalStart: values.arrivalStart.slice(0, 5) || undefined,
    arrivalEnd: values.arrivalEnd.slice(0, 5) || undefined,
    customerPrep: values.customerPrep.trim() || undefined,
  };
  const parsed = createFollowUpSchema.safeParse(raw);
  const fields: Partial<Record<keyof FollowUpFormValues, string>> = {};
  if (Boolean(raw.arrivalStart) !== Boolean(raw.arrivalEnd)) fields[raw.arrivalStart ? "arrivalEnd" : "arrivalStart"] = "Give both ends of the arrival window";
  else if (raw.arrivalStart && raw.arrivalEnd && raw.arrivalEnd <= raw.arrivalStart) fields.arrivalEnd = "The window must end after it starts";
  if (parsed.success && Object.keys(fields).length === 0) return { ok: true, body: parsed.data };
  if (parsed.success) return { ok: false, fields };
  for (const issue of parsed.error.issues) {
    const key = issue.path[0] as keyof FollowUpFormValues;
    if ((followUpFormFields as readonly string[]).includes(String(key)) && !fields[key]) fields[key] = issue.message;
  }
  return { ok: false, fields };
}
