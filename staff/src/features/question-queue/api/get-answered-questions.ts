import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { answeredQuestionsResponseSchema, type AnsweredQuestionsResponse } from "#shared/schemas/question-queue";
import { apiFetch } from "#shared/ui/index";

/** Questions answered in the last `days` days, the most recently answered first, with who answered. */
export async function getAnsweredQuestions(days: number, signal?: AbortSignal): Promise<AnsweredQuestionsResponse> {
  return apiFetch(`/api/questions/answered?days=${days}`, { schema: answeredQuestionsResponseSchema, signal });
}

export function answeredQuestionsQueryOptions(days: number) {
  return queryOptions({ queryKey: ["questions", "answered", days] as const, queryFn: ({ signal }) => getAnsweredQuestions(days, signal) });
}

export function useAnsweredQuestions(days: number) {
  return useQuery({ ...answeredQuestionsQueryOptions(days), placeholderData: keepPreviousData });
}
