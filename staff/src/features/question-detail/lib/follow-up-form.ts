import { createFollowUpSchema, type CreateFollowUp } from "#shared/schemas/follow-ups";

/** What the booking form holds: text as typed, turned into the API's body on submit. */
export interface FollowUpFormValues {
  reason: string;
  reasonNote: string;
  scheduledFor: string;
  technicianId: string;
  isCallback: boolean;
}

export const emptyFollowUpForm: FollowUpFormValues = { reason: "", reasonNote: "", scheduledFor: "", technicianId: "", isCallback: false };

export const followUpFormFields = ["reason", "reasonNote", "scheduledFor", "technicianId", "isCallback"] as const;

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
  };
  const parsed = createFollowUpSchema.safeParse(raw);
  if (parsed.success) return { ok: true, body: parsed.data };
  const fields: Partial<Record<keyof FollowUpFormValues, string>> = {};
  for (const issue of parsed.error.issues) {
    const key = issue.path[0] as keyof FollowUpFormValues;
    if ((followUpFormFields as readonly string[]).includes(String(key)) && !fields[key]) fields[key] = issue.message;
  }
  return { ok: false, fields };
}
