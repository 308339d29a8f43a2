import { SERVICES } from "#shared/engine/index";
import type { CallbackReport } from "#shared/schemas/callback-report";
import type { FollowUpReason } from "#shared/schemas/follow-ups";

/**
 * The callback report's arithmetic, pure so it can be checked by hand: the repo gathers
 * plain rows, this turns them into rates, costs, medians and shares.
 */
export type SeedingVisitRow = {
  id: number;
  visitDate: string;
  services: readonly string[];
  technicianId: number | null;
  technicianName: string | null;
  customerId: number;
};

export type CallbackRow = {
  id: number;
  originVisitId: number;
  customerId: number;
  reason: FollowUpReason;
  labourHours: number | null;
  materialsCost: number | null;
};

export type AnswerWaitRow = { month: string; hours: number | null };
export type PlanStepsRow = { customerId: number; planId: number; stepsDue: number; stepsDone: number };

const round = (value: number, decimals: number) => {
  const f = 10 ** decimals;
  return Math.round((value + Number.EPSILON) * f) / f;
};

/** Callbacks per 100 seeding visits, to one decimal; null when there were no visits to divide by. */
export function ratePer100(callbacks: number, visits: number): number | null {
  return visits === 0 ? null : round((callbacks / visits) * 100, 1);
}

/** Share in per cent, to one decimal; null for an empty base. */
export function sharePct(part: number, whole: number): number | null {
  return whole === 0 ? null : round((part / whole) * 100, 1);
}

/** The middle value (the mean of the two middle ones for an even count); null for none. */
export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** Labour priced at the company's rate plus materials; missing figures count as nothing spent yet. */
export function callbackCost(callbacks: readonly CallbackRow[], labourRatePerHour: number) {
  const labourHours = callbacks.reduce((sum, c) => sum + (c.labourHours ?? 0), 0);
  const materialsCost = callbacks.reduce((sum, c) => sum + (c.materialsCost ?? 0), 0);
  const labourCost = labourHours * labourRatePerHour;
  return {
    callbacks: callbacks.length,
    labourHours: round(labourHours, 2),
    labourCost: round(labourCost, 2),
    materialsCost: round(materialsCost, 2),
    totalCost: round(labourCost + materialsCost, 2),
    averagePerCallback: callbacks.length ? round((labourCost + materialsCost) / callbacks.length, 2) : null,
  };
}

/** Every month from the range's first to its last, as YYYY-MM, so a chart has no gaps. */
export function monthsBetween(from: string, to: string): string[] {
  const months: string[] = [];
  let [year, month] = [Number(from.slice(0, 4)), Number(from.slice(5, 7))];
  const last = to.slice(0, 7);
  for (;;) {
    const key = `${year}-${String(month).padStart(2, "0")}`;
    if (key > last) break;
    months.push(key);
    month += 1;
    if (month === 13) [year, month] = [year + 1, 1];
  }
  return months;
}

function groupBy<T, K>(items: readonly T[], keyOf: (item: T) => K): Map<K, T[]> {
  const groups = new Map<K, T[]>();
  for (const item of items) {
    const key = keyOf(item);
    groups.set(key, [...(groups.get(key) ?? []), item]);
  }
  return groups;
}

export type ReportInput = {
  from: string;
  to: string;
  labourRatePerHour: number;
  visits: readonly SeedingVisitRow[];
  callbacks: readonly CallbackRow[];
  /** Null when the questions feature's tables are not there yet. */
  answerWaits: readonly AnswerWaitRow[] | null;
  plans: readonly PlanStepsRow[];
};

export function buildCallbackReport(input: ReportInput): CallbackReport {
  const visitsById = new Map(input.visits.map((v) => [v.id, v]));
  // Only callbacks from the cohort's seeding visits count, so every rate has a matching base.
  const callbacks = input.callbacks.filter((c) => visitsById.has(c.originVisitId));
  const originOf = (c: CallbackRow) => visitsById.get(c.originVisitId)!;
  const row = (visits: number, count: number) => ({ seedingVisits: visits, callbacks: count, ratePer100: ratePer100(count, visits) });

  const technicianKeys = groupBy(input.visits, (v) => v.technicianId);
  const byTechnician = [...technicianKeys.entries()]
    .map(([technicianId, visits]) => ({
      technicianId,
      technicianName: visits[0]!.technicianName ?? "Not recorded",
      ...row(visits.length, callbacks.filter((c) => originOf(c).technicianId === technicianId).length),
    }))
    .sort((a, b) => a.technicianName.localeCompare(b.technicianName));

  const byService = SERVICES.map((service) => ({
    service,
    ...row(
      input.visits.filter((v) => v.services.includes(service)).length,
      callbacks.filter((c) => originOf(c).services.includes(service)).length,
    ),
  })).filter((r) => r.seedingVisits > 0);

  const byReason = [...groupBy(callbacks, (c) => c.reason).entries()]
    .map(([reason, group]) => {
      const cost = callbackCost(group, input.labourRatePerHour);
      return { reason, callbacks: group.length, ratePer100: ratePer100(group.length, input.visits.length), labourHours: cost.labourHours, totalCost: cost.totalCost };
    })
    .sort((a, b) => b.callbacks - a.callbacks || a.reason.localeCompare(b.reason));

  const byMonth = monthsBetween(input.from, input.to).map((month) => {
    const group = callbacks.filter((c) => originOf(c).visitDate.startsWith(month));
    return {
      month,
      ...row(input.visits.filter((v) => v.visitDate.startsWith(month)).length, group.length),
      totalCost: callbackCost(group, input.labourRatePerHour).totalCost,
    };
  });

  return {
    range: { from: input.from, to: input.to },
    labourRatePerHour: input.labourRatePerHour,
    overall: row(input.visits.length, callbacks.length),
    byTechnician,
    byService,
    byReason,
    byMonth,
    cost: callbackCost(callbacks, input.labourRatePerHour),
    answerTime: input.answerWaits === null ? null : answerTime(input.answerWaits),
    adherence: adherence(input.plans, new Set(callbacks.map((c) => c.customerId))),
    notes: input.answerWaits === null ? ["Time to first answer needs the questions feature's tables, which this database does not have yet."] : [],
  };
}

function answerTime(waits: readonly AnswerWaitRow[]): NonNullable<CallbackReport["answerTime"]> {
  const hoursOf = (rows: readonly AnswerWaitRow[]) => rows.flatMap((w) => (w.hours === null ? [] : [w.hours]));
  const roundedMedian = (rows: readonly AnswerWaitRow[]) => {
    const m = median(hoursOf(rows));
    return m === null ? null : round(m, 1);
  };
  const answered = hoursOf(waits).length;
  return {
    questions: waits.length,
    answered,
    unanswered: waits.length - answered,
    medianHours: roundedMedian(waits),
    byMonth: [...groupBy(waits, (w) => w.month).entries()]
      .sort(([a], [b]) => a.localeCompare(b))
      .map(([month, rows]) => ({ month, answered: hoursOf(rows).length, medianHours: roundedMedian(rows) })),
  };
}

/** Steps done among steps already due, pooled over each group's plans. */
function adherence(plans: readonly PlanStepsRow[], hadCallback: ReadonlySet<number>): CallbackReport["adherence"] {
  return (["had_callback", "no_callback"] as const).map((group) => {
    const rows = plans.filter((p) => hadCallback.has(p.customerId) === (group === "had_callback"));
    const stepsDue = rows.reduce((sum, p) => sum + p.stepsDue, 0);
    const stepsDone = rows.reduce((sum, p) => sum + p.stepsDone, 0);
    return { group, customers: new Set(rows.map((p) => p.customerId)).size, plans: rows.length, stepsDue, stepsDone, sharePct: sharePct(stepsDone, stepsDue) };
  });
}
