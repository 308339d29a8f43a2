import { useMutation, useQueryClient } from "@tanstack/react-query";
import { assignQuestionResponseSchema, type AssignQuestionResponse } from "#shared/schemas/question-queue";
import { apiFetch } from "#shared/ui/index";
import { openQuestionsQueryKey, type QueuedQuestion } from "./open-questions.ts";

export interface AssignInput {
  messageId: number;
  /** Null unassigns. */
  userId: number | null;
  /** Shown in the queue straight away, before the server answers. */
  userName: string | null;
}

export async function assignQuestion({ messageId, userId }: AssignInput): Promise<AssignQuestionResponse> {
  return apiFetch(`/api/questions/${messageId}/assign`, { method: "POST", body: { userId }, schema: assignQuestionResponseSchema });
}

/**
 * Assigns or unassigns a question. The queue shows the change at once and puts the old
 * assignee back if the server refuses; either way the queue is re-read afterwards.
 */
export function useAssignQuestion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: assignQuestion,
    onMutate: async ({ messageId, userId, userName }) => {
      await queryClient.cancelQueries({ queryKey: openQuestionsQueryKey });
      const previous = queryClient.getQueryData<QueuedQuestion[]>(openQuestionsQueryKey);
      queryClient.setQueryData<QueuedQuestion[]>(openQuestionsQueryKey, (questions) =>
        questions?.map((q) => (q.messageId === messageId ? { ...q, assignedToId: userId, assignedToName: userName } : q)),
      );
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(openQuestionsQueryKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: openQuestionsQueryKey }),
  });
}
