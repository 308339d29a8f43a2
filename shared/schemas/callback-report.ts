import { z } from "zod";
import { isoDateSchema } from "../engine/index.ts";
import { FOLLOW_UP_REASONS } from "./follow-ups.ts";

/**
 * The manager's callback report. The cohort is the company's seeding visits (services
 * include overseeding, slit seeding or new seeding) dated within the range, and the
 * callbacks that came from them: a callback belongs to the visit of its care plan, or,
 * without a plan, to the lawn's latest seeding visit before it was booked. Rates are
 * callbacks per 100 seeding visits; months, technicians and services are those of the
 * original visit.
 */
export const callbackReportQuerySchema = z
  .object({ from: isoDateSchema.optional(), to: isoDateSchema.optional() })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: "The start must be on or before the end", path: ["from"] });
export type CallbackReportQuery = z.infer<typeof callbackReportQuerySchema>;

const rate = z.number().nullable();
const money = z.number();

export const rateRowSchema = z.object({ seedingVisits: z.number().int(), callbacks: z.number().int(), ratePer100: rate });

export const callbackReportSchema = z.object({
  range: z.object({ from: z.string(), to: z.string() }),
  labourRatePerHour: money,
  overall: rateRowSchema,
  byTechnician: z.array(rateRowSchema.extend({ technicianId: z.number().int().nullable(), technicianName: z.string() })),
  byService: z.array(rateRowSchema.extend({ service: z.string() })),
  byReason: z.array(z.object({ reason: z.enum(FOLLOW_UP_REASONS), callbacks: z.number().int(), ratePer100: rate, labourHours: z.number(), totalCost: money })),
  byMonth: z.array(rateRowSchema.extend({ month: z.string(), totalCost: money })),
  cost: z.object({
    callbacks: z.number().int(),
    labourHours: z.number(),
    labourCost: money,
    materialsCost: money,
    totalCost: money,
    averagePerCallback: money.nullable(),
  }),
  /** Null while the questions feature's tables are missing; see `notes`. */
  answerTime: z
    .object({
      questions: z.number().int(),
      answered: z.number().int(),
      unanswered: z.number().int(),
      medianHours: z.number().nullable(),
      byMonth: z.array(z.object({ month: z.string(), answered: z.number().int(), medianHours: z.number().nullable() })),
    })
    .nullable(),
  adherence: z.array(
    z.object({
      group: z.enum(["had_callback", "no_callback"]),
      customers: z.number().int(),
      plans: z.number().int(),
      stepsDue: z.number().int(),
      stepsDone: z.number().int(),
      sharePct: z.number().nullable(),
    }),
  ),
  notes: z.array(z.string()),
});
export type CallbackReport = z.infer<typeof callbackReportSchema>;
