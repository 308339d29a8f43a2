import { useEffect, useId, useRef, useState } from "react";
import { useTranslation } from "react-i18next";
import { Button } from "#shared/ui/index";

export interface SkipDialogProps {
  open: boolean;
  stepHeadline: string;
  onCancel: () => void;
  onSkip: (reason: string) => void;
}

const maxReasonLength = 300;

/**
 * Asks why a step is skipped; the answer is optional. A native modal <dialog> keeps focus
 * inside, closes on Escape and hands focus back to the Skip button by itself.
 */
export function SkipDialog({ open, stepHeadline, onCancel, onSkip }: SkipDialogProps) {
  const { t } = useTranslation();
  const dialogRef = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const reasonId = useId();
  const [reason, setReason] = useState("");

  useEffect(() => {
    const dialog = dialogRef.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={dialogRef}
      aria-labelledby={titleId}
      onClose={onCancel}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-2xl border-2 border-line-strong bg-surface p-0 text-ink backdrop:bg-ink/50"
    >
      <form
        method="dialog"
        className="flex flex-col gap-4 p-5"
        onSubmit={(event) => {
          event.preventDefault();
          onSkip(reason.trim());
          setReason("");
        }}
      >
        <h2 id={titleId} className="text-xl text-pine-900">
          {t("skip.title")}
        </h2>
        <p className="text-ink-soft">{stepHeadline}</p>
        <div className="flex flex-col gap-1">
          <label htmlFor={reasonId} className="font-semibold">
            {t("skip.reasonLabel")}
          </label>
          <textarea
            id={reasonId}
            value={reason}
            maxLength={maxReasonLength}
            rows={3}
            onChange={(event) => setReason(event.target.value)}
            placeholder={t("skip.reasonPlaceholder")}
            className="w-full rounded-lg border-2 border-line-strong bg-surface px-3 py-2 text-lg"
          />
        </div>
        <div className="flex flex-wrap gap-3">
          <Button type="submit">{t("skip.confirm")}</Button>
          <Button variant="secondary" onClick={onCancel}>
            {t("common.cancel")}
          </Button>
        </div>
      </form>
    </dialog>
  );
}
