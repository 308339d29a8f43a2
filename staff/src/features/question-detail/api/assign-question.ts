import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { assignQuestionResponseSchema, openQuestionsResponseSchema, type OpenQuestion } from "#shared/schemas/question-queue";
import { apiFetch } from "#shared/ui/index";

/** The same cache entry as the queue's, so both screens show one assignee. */
const openQuestionsKey = ["questions", "open"] as const;

/** The open question with this id (null once resolved), with who it is assigned to. */
export function useOpenQuestion(messageId: number | undefined) {
  return useQuery({
    queryKey: openQuestionsKey,
    queryFn: async ({ signal }) => (await apiFetch("/api/questions/open", { schema: openQuestionsResponseSchema, signal })).questions,
    enabled: messageId !== undefined,
    select: (questions: OpenQuestion[]) => questions.find((q) => q.messageId === messageId) ?? null,
  });
}

/** Assign to someone (or null to unassign); shown at once, put back if the server refuses. */
export function useAssignQuestion() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ messageId, userId }: { messageId: number; userId: number | null; userName: string | null }) =>
      apiFetch(`/api/questions/${messageId}/assign`, { method: "POST", body: { userId }, schema: assignQuestionResponseSchema }),
    onMutate: async ({ messageId, userId, userName }) => {
      await queryClient.cancelQueries({ queryKey: openQuestionsKey });
      const previous = queryClient.getQueryData<OpenQuestion[]>(openQuestionsKey);
      queryClient.setQueryData<OpenQuestion[]>(openQuestionsKey, (questions) =>
        questions?.map((q) => (q.messageId === messageId ? { ...q, assignedToId: userId, assignedToName: userName } : q)),
      );
      return { previous };
    },
    onError: (_error, _input, context) => {
      if (context?.previous) queryClient.setQueryData(openQuestionsKey, context.previous);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: openQuestionsKey }),
  });
}
