import { useId } from "react";
import { useTranslation } from "react-i18next";
import type { StoredStep } from "#shared/schemas/plans";
import { StepKindIcon } from "../../../common/components/step-kind-icon.tsx";
import { WhyDetails } from "../../../common/components/why-details.tsx";
import { cautionTexts } from "../../../common/lib/caution-texts.ts";
import { stepHeadline } from "../../../common/lib/step-words.ts";
import { formatHeight, useUnits } from "../../../common/lib/units.ts";
import { StepActions } from "./step-actions.tsx";

export interface StepCardProps {
  planId: number;
  step: StoredStep;
  cautions: readonly { id: string; text: string }[];
}

/** One of today's steps, big enough to read and tap with wet hands in the sun. */
export function StepCard({ planId, step, cautions }: StepCardProps) {
  const { t, i18n } = useTranslation();
  const units = useUnits();
  const headingId = useId();
  const headline = stepHeadline(step, t, i18n.language);
  const settled = step.state !== "pending";
  return (
    <article
      aria-labelledby={headingId}
      className={`rounded-2xl border-2 bg-surface p-5 ${settled ? "border-line" : "border-pine-700"}`}
    >
      <div className="flex items-start gap-3">
        <span className="mt-0.5 rounded-full bg-pine-100 p-2 text-pine-700">
          <StepKindIcon kind={step.kind} />
        </span>
        <h3 id={headingId} className={`text-xl leading-snug sm:text-2xl ${settled ? "text-ink-soft" : "text-pine-900"}`}>
          {headline}
        </h3>
      </div>
      <p className="mt-3">{step.detail}</p>
      {step.heightIn !== undefined && units === "metric" && (
        <p className="mt-2 font-semibold">{t("step.mowerHeight", { height: formatHeight(step.heightIn, units) })}</p>
      )}
      <StepActions planId={planId} step={step} headline={headline} />
      <WhyDetails text={step.why.text} source={step.why.source} provenance={step.why.provenance} cautions={cautionTexts(step.cautions, cautions)} />
    </article>
  );
}
