import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { openQuestionSchema } from "#shared/schemas/question-queue";
import { apiFetch } from "#shared/ui/index";

/*
 * The contract's open question, plus who it is assigned to once the server sends that
 * (the table has the column; the answer doesn't carry it yet). Until then every question
 * reads as unassigned, which is the truth: nobody can assign one yet.
 */
const queuedQuestionSchema = openQuestionSchema.extend({ assignedToId: z.number().int().nullable().optional() });
const queueResponseSchema = z.object({ questions: z.array(queuedQuestionSchema) });
export type QueuedQuestion = z.infer<typeof queuedQuestionSchema>;

/** Every open question of the company, oldest first (the server's order). */
export async function getOpenQuestions(signal?: AbortSignal): Promise<QueuedQuestion[]> {
  const { questions } = await apiFetch("/api/questions/open", { schema: queueResponseSchema, signal });
  return questions;
}

export function openQuestionsQueryOptions() {
  return queryOptions({
    queryKey: ["questions", "open"] as const,
    queryFn: ({ signal }) => getOpenQuestions(signal),
  });
}

/** Re-checked every half minute: homeowners ask while a technician has the queue open. */
export function useOpenQuestions() {
  return useQuery({ ...openQuestionsQueryOptions(), refetchInterval: 30_000 });
}
