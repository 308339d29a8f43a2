import { useTranslation } from "react-i18next";
import { maxAutomaticRetries } from "../api/ask-question.ts";

export interface UploadProgressProps {
  fraction: number;
  /** Failed attempts so far; above zero while retrying a dropped connection. */
  failures: number;
  /** Offline: the upload waits for the connection instead of failing. */
  paused: boolean;
}

export function UploadProgress({ fraction, failures, paused }: UploadProgressProps) {
  const { t } = useTranslation();
  const percent = Math.round(fraction * 100);
  return (
    <div role="status" className="rounded-lg border border-line bg-surface p-3">
      <p className="font-semibold">
        {paused ? t("ask.waitingForConnection") : failures > 0 ? t("ask.retrying", { attempt: failures, max: maxAutomaticRetries }) : t("ask.progress", { percent })}
      </p>
      <progress value={percent} max={100} aria-label={t("ask.progressLabel")} className="mt-2 h-3 w-full accent-pine-700" />
    </div>
  );
}
