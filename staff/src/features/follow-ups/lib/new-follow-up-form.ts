import { createFollowUpSchema, type CreateFollowUp } from "#shared/schemas/follow-ups";

/** The "Add a follow-up" form as typed; the lawn is picked from a customer search. */
export interface NewFollowUpValues {
  propertyId: string;
  reason: string;
  reasonNote: string;
  scheduledFor: string;
  technicianId: string;
  arrivalStart: string;
  arrivalEnd: string;
  customerPrep: string;
  isCallback: boolean;
}

export const emptyNewFollowUp: NewFollowUpValues = {
  propertyId: "", reason: "", reasonNote: "", scheduledFor: "", technicianId: "", arrivalStart: "", arrivalEnd: "", customerPrep: "", isCallback: false,
};

export const newFollowUpFields = [
  "propertyId", "reason", "reasonNote", "scheduledFor", "technicianId", "arrivalStart", "arrivalEnd", "customerPrep", "isCallback",
] as const satisfies readonly (keyof NewFollowUpValues)[];

type Fields = Partial<Record<keyof NewFollowUpValues, string>>;
export type CheckedNewFollowUp = { ok: true; body: CreateFollowUp } | { ok: false; fields: Fields };

/** Checks with the API's own schema, plus the window rule the server applies, so messages match. */
export function toNewFollowUpBody(values: NewFollowUpValues): CheckedNewFollowUp {
  const fields: Fields = {};
  if (!values.propertyId) fields.propertyId = "Find the customer and pick the lawn";
  const start = values.arrivalStart.slice(0, 5);
  const end = values.arrivalEnd.slice(0, 5);
  if (Boolean(start) !== Boolean(end)) fields[start ? "arrivalEnd" : "arrivalStart"] = "Give both ends of the arrival window";
  else if (start && end <= start) fields.arrivalEnd = "The window must end after it starts";

  const parsed = createFollowUpSchema.safeParse({
    propertyId: values.propertyId ? Number(values.propertyId) : undefined,
    reason: values.reason,
    reasonNote: values.reasonNote.trim() || undefined,
    scheduledFor: values.scheduledFor || undefined,
    technicianId: values.technicianId ? Number(values.technicianId) : undefined,
    arrivalStart: start || undefined,
    arrivalEnd: end || undefined,
    customerPrep: values.customerPrep.trim() || undefined,
    isCallback: values.isCallback,
  });
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key = String(issue.path[0]) as keyof NewFollowUpValues;
      if ((newFollowUpFields as readonly string[]).includes(key) && !fields[key]) fields[key] = issue.message;
    }
  }
  if (!parsed.success || Object.keys(fields).length > 0) return { ok: false, fields };
  return { ok: true, body: parsed.data };
}
