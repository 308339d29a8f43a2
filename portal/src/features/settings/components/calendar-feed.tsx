import { useId, useState } from "react";
import { useTranslation } from "react-i18next";
import { Button, ErrorState, LoadingState, Notice } from "#shared/ui/index";
import { isNotFound, useErrorText } from "../../../common/lib/use-error-text.ts";
import { useCalendarFeed, useRotateCalendarFeed } from "../api/calendar-feed.ts";
import { ConfirmDialog } from "./confirm-dialog.tsx";

/** The private calendar link: copy it, or replace it if it was shared by mistake. */
export function CalendarFeed() {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const feed = useCalendarFeed();
  const rotate = useRotateCalendarFeed();
  const inputId = useId();
  const [copyState, setCopyState] = useState<"idle" | "copied" | "failed">("idle");
  const [confirming, setConfirming] = useState(false);

  if (feed.isPending) return <LoadingState label={t("common.loading")} />;
  if (feed.isError) {
    return (
      <ErrorState
        title={t("settings.calendar.heading")}
        error={feed.error}
        message={isNotFound(feed.error) ? t("settings.calendar.notAvailable") : errorText(feed.error)}
        onRetry={isNotFound(feed.error) ? undefined : () => void feed.refetch()}
        retryLabel={t("common.tryAgain")}
        retryingLabel={t("common.tryingAgain")}
      />
    );
  }

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(feed.data);
      setCopyState("copied");
    } catch {
      setCopyState("failed");
    }
  };

  return (
    <div className="flex flex-col gap-3">
      <p>{t("settings.calendar.explain")}</p>
      <label htmlFor={inputId} className="font-semibold">
        {t("settings.calendar.urlLabel")}
      </label>
      <input
        id={inputId}
        readOnly
        value={feed.data}
        onFocus={(event) => event.target.select()}
        className="min-h-12 w-full rounded-lg border-2 border-line-strong bg-canvas px-3 font-mono text-base"
      />
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => void copy()}>{copyState === "copied" ? t("settings.calendar.copied") : t("settings.calendar.copy")}</Button>
        <Button variant="secondary" onClick={() => setConfirming(true)} pending={rotate.isPending} pendingLabel={t("common.saving")}>
          {t("settings.calendar.rotate")}
        </Button>
      </div>
      <p aria-live="polite" className="sr-only">
        {copyState === "copied" ? t("settings.calendar.copied") : ""}
      </p>
      {copyState === "failed" && <Notice tone="warning">{t("settings.calendar.copyFailed")}</Notice>}
      {rotate.isSuccess && <Notice tone="success">{t("settings.calendar.rotated")}</Notice>}
      {rotate.isError && <Notice tone="danger">{errorText(rotate.error)}</Notice>}
      <ConfirmDialog
        open={confirming}
        message={t("settings.calendar.rotateConfirm")}
        confirmLabel={t("settings.calendar.rotateYes")}
        cancelLabel={t("common.cancel")}
        onCancel={() => setConfirming(false)}
        onConfirm={() => {
          setConfirming(false);
          setCopyState("idle");
          rotate.mutate();
        }}
      />
    </div>
  );
}
