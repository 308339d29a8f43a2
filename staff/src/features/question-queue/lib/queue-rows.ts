import type { StoredPlan } from "#shared/schemas/plans";
import { describePlanDay, type PlanDay } from "#shared/ui/index";
import type { QueuedQuestion } from "../api/get-open-questions.ts";

export const QUEUE_FILTERS = ["all", "mine", "unassigned", "overdue"] as const;
export type QueueFilter = (typeof QUEUE_FILTERS)[number];

export const QUEUE_FILTER_LABELS: Record<QueueFilter, string> = {
  all: "All open",
  mine: "Mine",
  unassigned: "Unassigned",
  overdue: "Overdue",
};

export interface QueueRow {
  question: QueuedQuestion;
  /** Undefined while the plan is still loading (or failed): the row shows without it. */
  plan: StoredPlan | undefined;
  planDay: PlanDay | undefined;
  /** The plan didn't load: the row says so instead of "loading" for ever. */
  planFailed: boolean;
}

export function buildRows(questions: readonly QueuedQuestion[], plans: Map<number, StoredPlan>, failed: Set<number>, now: Date): QueueRow[] {
  return questions.map((question) => {
    const plan = plans.get(question.planId);
    return { question, plan, planDay: plan ? describePlanDay(plan, now) : undefined, planFailed: failed.has(question.planId) };
  });
}

function matchesFilter(row: QueueRow, filter: QueueFilter, userId: number): boolean {
  const assignedTo = row.question.assignedToId ?? null;
  switch (filter) {
    case "all":
      return true;
    case "mine":
      return assignedTo === userId;
    case "unassigned":
      return assignedTo === null;
    case "overdue":
      return row.question.overdue;
  }
}

function matchesService(row: QueueRow, service: string | null): boolean {
  return service === null || (row.plan?.services.includes(service) ?? false);
}

export function filterRows(rows: readonly QueueRow[], filter: QueueFilter, service: string | null, userId: number): QueueRow[] {
  return rows.filter((row) => matchesFilter(row, filter, userId) && matchesService(row, service));
}

/** How many questions each filter would show, within the chosen service type. */
export function countByFilter(rows: readonly QueueRow[], service: string | null, userId: number): Record<QueueFilter, number> {
  const inService = rows.filter((row) => matchesService(row, service));
  return Object.fromEntries(QUEUE_FILTERS.map((f) => [f, inService.filter((row) => matchesFilter(row, f, userId)).length])) as Record<QueueFilter, number>;
}

/** Service types present in the queue with their counts, within the chosen filter. */
export function countByService(rows: readonly QueueRow[], filter: QueueFilter, userId: number): Map<string, number> {
  const counts = new Map<string, number>();
  for (const row of rows) {
    if (!matchesFilter(row, filter, userId)) continue;
    for (const service of row.plan?.services ?? []) counts.set(service, (counts.get(service) ?? 0) + 1);
  }
  return counts;
}

export function isQueueFilter(value: string | null): value is QueueFilter {
  return (QUEUE_FILTERS as readonly string[]).includes(value ?? "");
}
