import { z } from "zod";
import {
  FOLLOW_UP_OUTCOMES,
  FOLLOW_UP_REASONS,
  FOLLOW_UP_STATUSES,
  type FollowUp,
  type UpdateFollowUp,
} from "#shared/schemas/follow-ups";

/** Optional number typed as text: empty means "not recorded". Bounds match shared/schemas/follow-ups. */
const numberText = (max: number, maxMessage: string) =>
  z
    .string()
    .trim()
    .refine((t) => t === "" || Number.isFinite(Number(t)), "Enter a number, such as 1.5")
    .refine((t) => t === "" || Number(t) >= 0, "Must be 0 or more")
    .refine((t) => t === "" || Number(t) <= max, maxMessage);

const note = z.string().trim().max(2000, "Keep it under 2,000 characters");

/**
 * The dialog's fields as typed. The rules that tie fields together are the server's
 * (follow-ups service); they are repeated here only so the person sees them before sending.
 */
export const followUpFormSchema = z
  .object({
    status: z.enum(FOLLOW_UP_STATUSES),
    scheduledFor: z.string(),
    technicianId: z.string(),
    reason: z.enum(FOLLOW_UP_REASONS, "Pick a reason from the list"),
    reasonNote: note,
    isCallback: z.boolean(),
    labourHours: numberText(200, "Must be at most 200 hours"),
    materialsCost: numberText(100_000, "Must be at most 100,000"),
    outcome: z.enum(FOLLOW_UP_OUTCOMES),
    outcomeNote: note,
    arrivalStart: z.string(),
    arrivalEnd: z.string(),
    customerPrep: z.string().trim().max(500, "Keep it under 500 characters"),
    workDone: note,
  })
  .superRefine((v, ctx) => {
    if (Boolean(v.arrivalStart) !== Boolean(v.arrivalEnd)) {
      ctx.addIssue({ code: "custom", path: [v.arrivalStart ? "arrivalEnd" : "arrivalStart"], message: "Give both ends of the arrival window" });
    } else if (v.arrivalStart && v.arrivalEnd.slice(0, 5) <= v.arrivalStart.slice(0, 5)) {
      ctx.addIssue({ code: "custom", path: ["arrivalEnd"], message: "The window must end after it starts" });
    }
    const needsVisit = v.status === "scheduled" || v.status === "done";
    if (needsVisit && !v.scheduledFor) ctx.addIssue({ code: "custom", path: ["scheduledFor"], message: "Give the date of the visit" });
    if (needsVisit && !v.technicianId) ctx.addIssue({ code: "custom", path: ["technicianId"], message: "Pick the technician who goes" });
    if (v.isCallback && v.status === "done" && v.labourHours === "") {
      ctx.addIssue({ code: "custom", path: ["labourHours"], message: "Record the labor hours of this callback" });
    }
    if (v.isCallback && v.status === "closed" && v.outcome === "pending") {
      ctx.addIssue({ code: "custom", path: ["outcome"], message: "Record how the callback turned out before closing it" });
    }
  });

export type FollowUpFormValues = z.infer<typeof followUpFormSchema>;
export const followUpFormFields = [
  "status", "scheduledFor", "technicianId", "reason", "reasonNote", "isCallback", "labourHours", "materialsCost", "outcome", "outcomeNote",
  "arrivalStart", "arrivalEnd", "customerPrep", "workDone",
] as const satisfies readonly (keyof FollowUpFormValues)[];

const text = (value: number | string | null) => (value === null ? "" : String(value));
const numberOrNull = (t: string) => (t.trim() === "" ? null : Number(t));
const textOrNull = (t: string) => (t.trim() === "" ? null : t.trim());

export function formValuesOf(followUp: FollowUp, status: FollowUp["status"] = followUp.status): FollowUpFormValues {
  return {
    status,
    scheduledFor: text(followUp.scheduledFor),
    technicianId: text(followUp.technicianId),
    reason: followUp.reason,
    reasonNote: text(followUp.reasonNote),
    isCallback: followUp.isCallback,
    labourHours: text(followUp.labourHours),
    materialsCost: text(followUp.materialsCost),
    outcome: followUp.outcome,
    outcomeNote: text(followUp.outcomeNote),
    arrivalStart: text(followUp.arrivalStart),
    arrivalEnd: text(followUp.arrivalEnd),
    customerPrep: text(followUp.customerPrep),
    workDone: text(followUp.workDone),
  };
}

/** Only what changed, so a closed follow-up's cost can be corrected without touching anything else. */
export function patchOf(current: FollowUp, values: FollowUpFormValues): UpdateFollowUp {
  const next: UpdateFollowUp = {
    status: values.status,
    scheduledFor: textOrNull(values.scheduledFor),
    technicianId: values.technicianId ? Number(values.technicianId) : null,
    reason: values.reason,
    reasonNote: textOrNull(values.reasonNote),
    isCallback: values.isCallback,
    // A time input may carry seconds in some browsers; the API takes HH:MM.
    arrivalStart: textOrNull(values.arrivalStart.slice(0, 5)),
    arrivalEnd: textOrNull(values.arrivalEnd.slice(0, 5)),
    customerPrep: textOrNull(values.customerPrep),
    workDone: textOrNull(values.workDone),
    // Only a callback carries a cost and an outcome; the server clears them when it stops being one.
    ...(values.isCallback
      ? {
          labourHours: numberOrNull(values.labourHours),
          materialsCost: numberOrNull(values.materialsCost),
          outcome: values.outcome,
          outcomeNote: textOrNull(values.outcomeNote),
        }
      : {}),
  };
  const patch: UpdateFollowUp = {};
  for (const [key, value] of Object.entries(next) as [keyof UpdateFollowUp, unknown][]) {
    if (value !== current[key]) (patch as Record<string, unknown>)[key] = value;
  }
  return patch;
}
