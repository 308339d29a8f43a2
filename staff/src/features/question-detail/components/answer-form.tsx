import { useState } from "react";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import type { z } from "zod";
import { answerSchema } from "#shared/schemas/answers";
import { Button, CheckboxField, Notice, TextAreaField, applyServerErrors, isApiRequestError } from "#shared/ui/index";
import { useAnswerQuestion } from "../api/post-answer.ts";
import { AnswerPhotoField } from "./answer-photo-field.tsx";
import { SavedReplyPicker } from "./saved-reply-picker.tsx";

type AnswerFormInput = z.input<typeof answerSchema>;
type AnswerFormOutput = z.output<typeof answerSchema>;

/** The technician's answer: free text or a saved reply, a photo if it helps, and whether the question is done. */
export function AnswerForm({ planId, customerFirstName }: { planId: number; customerFirstName: string | null }) {
  const form = useForm<AnswerFormInput, unknown, AnswerFormOutput>({ resolver: zodResolver(answerSchema), defaultValues: { text: "", resolve: true } });
  const { register, handleSubmit, setError, setValue, getValues, setFocus, formState } = form;
  const answer = useAnswerQuestion(planId);
  const [photo, setPhoto] = useState<File | null>(null);
  const [photoError, setPhotoError] = useState<string>();
  const [formMessage, setFormMessage] = useState<string | null>(null);
  const [sent, setSent] = useState<{ resolved: boolean } | null>(null);

  const insertReply = (text: string) => {
    const current = getValues("text").trim();
    setValue("text", current ? `${current}\n\n${text}` : text, { shouldDirty: true, shouldValidate: formState.isSubmitted });
    setFocus("text");
  };

  const submit = handleSubmit((values) => {
    setFormMessage(null);
    setSent(null);
    answer.mutate(
      { text: values.text, resolve: values.resolve ?? false, photo },
      {
        onSuccess: () => {
          setSent({ resolved: values.resolve ?? false });
          form.reset({ text: "", resolve: true });
          setPhoto(null);
        },
        // The text and photo stay in the form, so nothing typed is lost.
        onError: (error) => {
          if (isApiRequestError(error) && error.fields.photos) setPhotoError(error.fields.photos);
          setFormMessage(applyServerErrors(error, setError, ["text", "resolve"]));
        },
      },
    );
  });

  return (
    <section aria-labelledby="answer-heading" className="rounded-xl border border-line bg-surface p-4 sm:p-5">
      <h2 id="answer-heading" className="text-2xl text-pine-900">
        Answer {customerFirstName ?? "the homeowner"}
      </h2>
      <form noValidate onSubmit={submit} className="mt-3 flex flex-col gap-4">
        {sent && (
          <Notice tone="success" title="Answer sent">
            {sent.resolved ? "The question is marked answered and has left the queue." : "The question stays in the queue until someone marks it answered."}
          </Notice>
        )}
        {formMessage && (
          <Notice tone="danger" title="The answer wasn't sent">
            {formMessage}
          </Notice>
        )}
        <SavedReplyPicker planId={planId} onInsert={insertReply} />
        <TextAreaField label="Your answer" rows={6} error={formState.errors.text?.message} {...register("text")} />
        <AnswerPhotoField
          photo={photo}
          error={photoError}
          onChange={(file, error) => {
            setPhoto(file);
            setPhotoError(error);
          }}
        />
        <CheckboxField label="Mark the question answered" hint="It leaves the question queue. Leave this off to keep it open for a follow-up." {...register("resolve")} />
        <Button type="submit" className="self-start" pending={answer.isPending} pendingLabel="Sending…">
          Send answer
        </Button>
      </form>
    </section>
  );
}
