import type { QueuePlanDay } from "#shared/schemas/question-queue";
import type { QueuedQuestion } from "../../../common/api/open-questions.ts";

export const QUEUE_FILTERS = ["all", "mine", "unassigned", "overdue"] as const;
export type QueueFilter = (typeof QUEUE_FILTERS)[number];

export const QUEUE_FILTER_LABELS: Record<QueueFilter, string> = {
  all: "All open",
  mine: "Mine",
  unassigned: "Unassigned",
  overdue: "Overdue",
};

const phaseNames: Record<string, string> = {
  prep: "preparation",
  germination: "germination",
  establishment: "establishment",
  maturing: "maturing",
};

export interface QueueRow {
  question: QueuedQuestion;
  /** "day 9 of the germination phase", from the plan day the server worked out on the lawn's calendar. */
  planDayText: string;
  /** A staff answer came after the question, but nobody marked it resolved. */
  answered: boolean;
}

export function describeQueuePlanDay(day: QueuePlanDay): string {
  if (day.phase && day.phase !== "prep" && day.dayOfPhase !== null) return `day ${day.dayOfPhase} of the ${phaseNames[day.phase] ?? day.phase} phase`;
  if (day.dayOfPlan === null) return "before the visit";
  return `day ${day.dayOfPlan} after the visit`;
}

export function isAnswered(question: QueuedQuestion): boolean {
  return question.lastAnsweredAt !== null && Date.parse(question.lastAnsweredAt) > Date.parse(question.waitingSince);
}

export function buildRows(questions: readonly QueuedQuestion[]): QueueRow[] {
  return questions.map((question) => ({ question, planDayText: describeQueuePlanDay(question.planDay), answered: isAnswered(question) }));
}

function matchesFilter(row: QueueRow, filter: QueueFilter, userId: number): boolean {
  switch (filter) {
    case "all":
      return true;
    case "mine":
      return row.question.assignedToId === userId;
    case "unassigned":
      return row.question.assignedToId === null;
    case "overdue":
      return row.question.overdue;
  }
}

function matchesService(row: QueueRow, service: string | null): boolean {
  return service === null || row.question.services.includes(service);
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
    for (const service of row.question.services) counts.set(service, (counts.get(service) ?? 0) + 1);
  }
  return counts;
}

export function isQueueFilter(value: string | null): value is QueueFilter {
  return (QUEUE_FILTERS as readonly string[]).includes(value ?? "");
}
