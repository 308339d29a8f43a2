import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useId, useState } from "react";
import { useForm } from "react-hook-form";
import { useTranslation } from "react-i18next";
import { useNavigate } from "react-router-dom";
import { photoLimits, questionTextSchema } from "#shared/schemas/questions";
import { Button, applyServerErrors, isApiRequestError } from "#shared/ui/index";
import { useErrorText } from "../../../common/lib/use-error-text.ts";
import { useAskQuestion } from "../api/ask-question.ts";
import { checkPickedPhotos, maxPhotoMegabytes, type PhotoProblem } from "../lib/check-photos.ts";
import { downscaleImage } from "../lib/downscale-image.ts";
import { clearDraft, readDraft, saveDraft } from "../lib/draft.ts";
import { PhotoPicker } from "./photo-picker.tsx";
import { UploadProgress } from "./upload-progress.tsx";

interface QuestionValues {
  text: string;
}

/** Server refusals that are about the photos; shown beside them, not above the form. */
const photoErrorCodes = new Set(["unsupported_type", "file_too_large", "too_many_files", "invalid_image", "invalid_upload", "image_too_large", "image_contains_code"]);

export interface QuestionFormProps {
  planId: number;
  initialText: string;
}

export function QuestionForm({ planId, initialText }: QuestionFormProps) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const navigate = useNavigate();
  const textId = useId();
  const [photos, setPhotos] = useState<File[]>([]);
  const [photoProblems, setPhotoProblems] = useState<string[]>([]);
  const [preparing, setPreparing] = useState(false);
  const [progress, setProgress] = useState(0);
  const [formError, setFormError] = useState<string | null>(null);
  const ask = useAskQuestion(planId, setProgress);

  const form = useForm<QuestionValues>({
    resolver: zodResolver(questionTextSchema),
    defaultValues: { text: readDraft(planId) ?? initialText },
  });

  // Keep the typed question through a reload or a lost tab, not only through a failed send.
  useEffect(() => {
    const subscription = form.watch((values) => saveDraft(planId, values.text ?? ""));
    return () => subscription.unsubscribe();
  }, [form, planId]);

  const describeProblem = (problem: PhotoProblem) => {
    if (problem.kind === "tooMany") return t("ask.tooMany", { max: photoLimits.maxCount });
    if (problem.kind === "wrongType") return t("ask.wrongType", { name: problem.name });
    return t("ask.tooLarge", { name: problem.name, size: maxPhotoMegabytes });
  };

  const addPhotos = (picked: File[]) => {
    const { accepted, problems } = checkPickedPhotos(photos.length, picked);
    setPhotos((current) => [...current, ...accepted]);
    setPhotoProblems(problems.map(describeProblem));
  };

  const showFailure = (error: unknown) => {
    if (isApiRequestError(error) && photoErrorCodes.has(error.code)) {
      setPhotoProblems([error.message]);
      setFormError(null);
      return;
    }
    setFormError(applyServerErrors(error, form.setError, ["text"]) === null ? null : errorText(error));
  };

  const send = (upload: { text: string; photos: File[] }) => {
    setFormError(null);
    ask.mutate(upload, {
      onSuccess: () => {
        clearDraft(planId);
        navigate("/messages", { state: { sent: true } });
      },
      onError: showFailure,
    });
  };

  const onSubmit = form.handleSubmit(async ({ text }) => {
    setPhotoProblems([]);
    setPreparing(true);
    const prepared = await Promise.all(photos.map(downscaleImage));
    setPreparing(false);
    const stillTooLarge = prepared.filter((photo) => photo.size > photoLimits.maxBytes);
    if (stillTooLarge.length > 0) {
      setPhotoProblems(stillTooLarge.map((photo) => describeProblem({ kind: "tooLarge", name: photo.name })));
      return;
    }
    send({ text, photos: prepared });
  });

  const busy = preparing || ask.isPending;
  const textError = form.formState.errors.text?.message;

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-6">
      <div className="flex flex-col gap-1">
        <label htmlFor={textId} className="font-semibold">
          {t("ask.questionLabel")}
        </label>
        <p id={`${textId}-hint`} className="text-base text-ink-soft">
          {t("ask.questionHint")}
        </p>
        <textarea
          id={textId}
          rows={5}
          aria-invalid={textError ? true : undefined}
          aria-describedby={textError ? `${textId}-hint ${textId}-error` : `${textId}-hint`}
          className={`w-full rounded-lg border-2 bg-surface px-3 py-2 text-lg ${textError ? "border-rust-700" : "border-line-strong"}`}
          readOnly={busy}
          {...form.register("text")}
        />
        {textError && (
          <p id={`${textId}-error`} className="flex items-start gap-1 font-semibold text-rust-700">
            <span aria-hidden="true">⚠</span>
            {textError}
          </p>
        )}
      </div>

      <PhotoPicker
        photos={photos}
        onAdd={addPhotos}
        onRemove={(index) => setPhotos((current) => current.filter((_, i) => i !== index))}
        errors={photoProblems}
        disabled={busy}
      />

      {preparing && <p role="status">{t("ask.preparing")}</p>}
      {ask.isPending && <UploadProgress fraction={progress} failures={ask.failureCount} paused={ask.isPaused} />}

      {formError && (
        <div role="alert" className="rounded-lg border-l-4 border-rust-700 bg-rust-50 p-4 text-rust-700">
          <p className="font-bold">{t("ask.failedTitle")}</p>
          <p className="mt-1">{formError}</p>
          <p className="mt-1">{t("ask.keptNote")}</p>
          {ask.variables && (
            <Button variant="secondary" className="mt-3" onClick={() => ask.variables && send(ask.variables)}>
              {t("ask.retry")}
            </Button>
          )}
        </div>
      )}

      <Button type="submit" className="w-full min-h-14 text-lg sm:w-auto sm:self-start" pending={busy} pendingLabel={preparing ? t("ask.preparing") : t("ask.sending")}>
        {t("ask.send")}
      </Button>
    </form>
  );
}
