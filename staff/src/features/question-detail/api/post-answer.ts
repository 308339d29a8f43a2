import { useMutation, useQueryClient } from "@tanstack/react-query";
import { questionCreatedSchema, type ThreadMessage } from "#shared/schemas/questions";
import { apiFetch, apiPostForm } from "#shared/ui/index";

export interface AnswerUpload {
  text: string;
  resolve: boolean;
  photo: File | null;
}

/** JSON without a photo; multipart with the same fields when a photo goes along. */
export async function postAnswer(planId: number, { text, resolve, photo }: AnswerUpload): Promise<ThreadMessage> {
  const path = `/api/plans/${planId}/answers`;
  if (!photo) {
    const { message } = await apiFetch(path, { method: "POST", body: { text, resolve }, schema: questionCreatedSchema });
    return message;
  }
  const form = new FormData();
  form.append("text", text);
  form.append("resolve", String(resolve));
  form.append("photos", photo, photo.name);
  const { message } = await apiPostForm(path, form, { schema: questionCreatedSchema });
  return message;
}

/** Sends the answer; the thread, the queue and the customer's page then show it. */
export function useAnswerQuestion(planId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (upload: AnswerUpload) => postAnswer(planId, upload),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: ["plans", planId, "thread"] }),
        queryClient.invalidateQueries({ queryKey: ["questions", "open"] }),
      ]),
  });
}
