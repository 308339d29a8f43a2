import { useTranslation } from "react-i18next";
import type { StoredStep } from "#shared/schemas/plans";
import { StepKindIcon } from "../../../common/components/step-kind-icon.tsx";
import { WhyDetails } from "../../../common/components/why-details.tsx";
import { cautionTexts } from "../../../common/lib/caution-texts.ts";
import { stepHeadline } from "../../../common/lib/step-words.ts";
import { formatHeight, useUnits } from "../../../common/lib/units.ts";

export interface DayStepProps {
  step: StoredStep;
  isPast: boolean;
  cautions: readonly { id: string; text: string }[];
}

const badgeStyles = {
  done: "bg-pine-700 text-white",
  skipped: "bg-loam-100 text-loam-700",
  missed: "border border-line-strong text-ink-soft",
  pending: "",
} as const;

/** One step in the timeline: what, whether it was done, and why (on screen only). */
export function DayStep({ step, isPast, cautions }: DayStepProps) {
  const { t, i18n } = useTranslation();
  const units = useUnits();
  const status = step.state !== "pending" ? step.state : isPast ? "missed" : "pending";
  return (
    <div className="py-3">
      <div className="flex items-start gap-3">
        <StepKindIcon kind={step.kind} className="mt-0.5 size-6 text-pine-700" />
        <div className="min-w-0 flex-1">
          <p className="font-semibold">
            {stepHeadline(step, t, i18n.language)}
            {status !== "pending" && (
              <span className={`ml-2 inline-block rounded-full px-2 py-0.5 align-middle text-sm font-bold ${badgeStyles[status]}`}>
                {status === "done" && "✓ "}
                {t(`plan.stepState.${status}`)}
              </span>
            )}
          </p>
          <p className="mt-1 text-base text-ink-soft">{step.detail}</p>
          {step.heightIn !== undefined && units === "metric" && (
            <p className="mt-1 text-base">{t("step.mowerHeight", { height: formatHeight(step.heightIn, units) })}</p>
          )}
          {step.state === "skipped" && step.skipReason && <p className="mt-1 text-base italic">“{step.skipReason}”</p>}
          <WhyDetails text={step.why.text} source={step.why.source} provenance={step.why.provenance} cautions={cautionTexts(step.cautions, cautions)} />
        </div>
      </div>
    </div>
  );
}
