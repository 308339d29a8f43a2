import { queryOptions, useQuery } from "@tanstack/react-query";
import { openQuestionsResponseSchema, type OpenQuestion } from "#shared/schemas/question-queue";
import { apiFetch } from "#shared/ui/index";

export type QueuedQuestion = OpenQuestion;

export const openQuestionsQueryKey = ["questions", "open"] as const;

/**
 * Every open question of the company: those with no answer after them first, then the
 * oldest waiting (the server's order). Each carries its plan day, services and assignee,
 * so the queue needs no other request.
 */
export async function getOpenQuestions(signal?: AbortSignal): Promise<QueuedQuestion[]> {
  const { questions } = await apiFetch("/api/questions/open", { schema: openQuestionsResponseSchema, signal });
  return questions;
}

export function openQuestionsQueryOptions() {
  return queryOptions({
    queryKey: openQuestionsQueryKey,
    queryFn: ({ signal }) => getOpenQuestions(signal),
  });
}

/** The open question with this id (null once resolved), from the queue's own cache entry, so both screens show one assignee. */
export function useOpenQuestion(messageId: number | undefined) {
  return useQuery({
    ...openQuestionsQueryOptions(),
    enabled: messageId !== undefined,
    select: (questions: QueuedQuestion[]) => questions.find((q) => q.messageId === messageId) ?? null,
  });
}

/** Re-checked every half minute: homeowners ask while a technician has the queue open. */
export function useOpenQuestions() {
  return useQuery({ ...openQuestionsQueryOptions(), refetchInterval: 30_000 });
}
