import { z } from "zod";
import { bigRecordId, recordId } from "./ids.ts";

/**
 * Care plans as the API serves them: the engine's plan, stored, with each step's id and
 * the homeowner's done/skipped state. The engine's own types live in shared/engine.
 */
const provenanceSchema = z.enum(["published", "common practice", "from memory"]);
export const whySchema = z.object({ text: z.string(), source: z.string(), provenance: provenanceSchema });

export const cycleAndSoakSchema = z.object({
  runsPerCycle: z.number().int(),
  soakMinutes: z.number(),
  minutesBefore: z.number(),
  cycleStarts: z.array(z.string()),
});

export const stepStateSchema = z.enum(["pending", "done", "skipped"]);
export type StepState = z.infer<typeof stepStateSchema>;

export const storedStepSchema = z.object({
  id: z.number().int(),
  key: z.string(),
  date: z.string(),
  phase: z.enum(["prep", "germination", "establishment", "maturing"]),
  kind: z.string(),
  title: z.string(),
  detail: z.string(),
  times: z.array(z.string()).optional(),
  minutesPerCycle: z.number().optional(),
  /** On a slope: each watering is split into runs of `minutesPerCycle`; `times` lists every run, `cycleStarts` each watering's first. */
  cycleAndSoak: cycleAndSoakSchema.optional(),
  heightIn: z.number().optional(),
  why: whySchema,
  cautions: z.array(z.string()),
  state: stepStateSchema,
  stateChangedAt: z.string().nullable(),
  skipReason: z.string().nullable(),
});
export type StoredStep = z.infer<typeof storedStepSchema>;

export const holdOffSchema = z.object({
  kind: z.string(),
  start: z.string(),
  end: z.string(),
  why: z.string(),
  source: z.string(),
  provenance: provenanceSchema,
  cautions: z.array(z.string()),
});
export type StoredHoldOff = z.infer<typeof holdOffSchema>;

export const planWarningSchema = z.object({
  code: z.string(),
  /** Customers are only ever sent "homeowner" warnings; staff get both. */
  audience: z.enum(["crew", "homeowner"]),
  severity: z.enum(["risk", "caution", "info"]),
  message: z.string(),
  reason: z.string(),
  source: z.string(),
  provenance: provenanceSchema,
});

export const planProgressSchema = z.object({ done: z.number().int(), skipped: z.number().int(), total: z.number().int() });

export const planHeaderSchema = z.object({
  id: z.number().int(),
  propertyId: z.number().int(),
  propertyLabel: z.string(),
  street: z.string(),
  timeZone: z.string(),
  visitId: z.number().int(),
  visitDate: z.string(),
  services: z.array(z.string()),
  programVersion: z.number().int(),
  status: z.enum(["active", "cancelled"]),
  progress: planProgressSchema,
});
export type PlanHeader = z.infer<typeof planHeaderSchema>;

export const storedPlanSchema = planHeaderSchema.extend({
  phases: z.array(z.object({ phase: z.string(), start: z.string(), end: z.string() })),
  firstMowDate: z.string().nullable(),
  holdOffs: z.array(holdOffSchema),
  warnings: z.array(planWarningSchema),
  cautions: z.array(z.object({ id: z.string(), text: z.string() })),
  /** The engine's calculator figures for the visit (seed, products, watering). */
  figures: z.record(z.string(), z.unknown()),
  steps: z.array(storedStepSchema),
});
export type StoredPlan = z.infer<typeof storedPlanSchema>;

export const planListResponseSchema = z.object({ plans: z.array(planHeaderSchema) });
export const planResponseSchema = z.object({ plan: storedPlanSchema });

/** What the homeowner needs to act on today, computed in the property's time zone. */
export const todayResponseSchema = z.object({
  today: z.string(),
  plan: planHeaderSchema,
  steps: z.array(storedStepSchema),
  activeHoldOffs: z.array(holdOffSchema),
  nextMilestone: z.object({ kind: z.string(), date: z.string(), title: z.string() }).nullable(),
  warnings: z.array(planWarningSchema),
  cautions: z.array(z.object({ id: z.string(), text: z.string() })),
});
export type TodayResponse = z.infer<typeof todayResponseSchema>;

export const changeStepStateSchema = z.object({
  state: stepStateSchema,
  reason: z.string().trim().max(300, "Keep the reason under 300 characters").optional(),
});
export type ChangeStepState = z.infer<typeof changeStepStateSchema>;

export const planStepParamsSchema = z.object({ planId: recordId, stepId: bigRecordId });
export const planIdParamsSchema = z.object({ planId: recordId });
