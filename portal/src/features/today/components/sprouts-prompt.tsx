import { useState } from "react";
import { useTranslation } from "react-i18next";
import { Button, Notice } from "#shared/ui/index";
import { useErrorText } from "../../../common/lib/use-error-text.ts";
import { useReportSprouts } from "../api/report-sprouts.ts";

const reportedKey = (planId: number) => `sproutline.sproutsReported.${planId}`;

/** Once told, we don't ask again on this device (the server keeps the observation itself). */
export function sproutsAlreadyReported(planId: number): boolean {
  try {
    return localStorage.getItem(reportedKey(planId)) === "yes";
  } catch {
    return false;
  }
}

function rememberReported(planId: number) {
  try {
    localStorage.setItem(reportedKey(planId), "yes");
  } catch {
    // Not fatal: at worst the question shows again.
  }
}

export interface SproutsPromptProps {
  planId: number;
  /** Days since the visit: the engine wants the day the sprouts were seen. */
  dayOfPlan: number;
}

/**
 * Seed that comes up early or late changes the watering; telling us moves the plan on.
 * Asks to confirm first, because the change to the plan can't be taken back from here.
 */
export function SproutsPrompt({ planId, dayOfPlan }: SproutsPromptProps) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const report = useReportSprouts(planId);
  const [confirming, setConfirming] = useState(false);

  if (report.isSuccess) {
    return <Notice tone="success" title={t("sprouts.thanksTitle")}>{t("sprouts.thanksBody")}</Notice>;
  }

  return (
    <div className="rounded-xl border-2 border-pine-700 bg-pine-50 p-4">
      <p className="text-lg font-semibold text-pine-900">{t("sprouts.question")}</p>
      <p className="mt-1">{t("sprouts.explain")}</p>
      {confirming ? (
        <div className="mt-3">
          <p className="font-semibold">{t("sprouts.confirm", { day: dayOfPlan })}</p>
          <div className="mt-2 flex flex-wrap gap-3">
            <Button onClick={() => report.mutate(dayOfPlan, { onSuccess: () => rememberReported(planId) })} pending={report.isPending} pendingLabel={t("common.saving")}>
              {t("sprouts.yes")}
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              {t("sprouts.notYet")}
            </Button>
          </div>
        </div>
      ) : (
        <Button variant="secondary" className="mt-3" onClick={() => setConfirming(true)}>
          {t("sprouts.action")}
        </Button>
      )}
      {report.isError && (
        <p role="alert" className="mt-2 font-semibold text-rust-700">
          {errorText(report.error)}
        </p>
      )}
    </div>
  );
}
