import { memo, useMemo } from "react";
import type { CautionId, Plan } from "#shared/engine/index";
import { CrewWarnings } from "../../../common/components/crew-warnings.tsx";
import { formatDay } from "../lib/local-dates.ts";
import { PlanFigures } from "./plan-figures.tsx";
import { PlanHoldOffs } from "./plan-hold-offs.tsx";
import { PlanTimeline } from "./plan-timeline.tsx";

/**
 * Everything the engine worked out for the previewed visit. Memoised: the form
 * re-renders on every keystroke, the plan only changes when a new answer arrives.
 */
export const PlanResults = memo(function PlanResults({ plan }: { plan: Plan }) {
  const cautionTexts = useMemo(() => new Map<CautionId, string>(plan.cautions.map((c) => [c.id, c.text])), [plan.cautions]);
  const { meta } = plan;
  return (
    <div className="flex flex-col gap-8">
      <p data-testid="plan-meta" className="text-base text-ink-soft">
        Care program version <span className="font-semibold text-ink">{meta.programVersion}</span> · visit{" "}
        {formatDay(meta.visitDate, { withYear: true })} · plan ends {formatDay(meta.planEnds)}
        {meta.firstMowDate && <> · first mow {formatDay(meta.firstMowDate)}</>} · times in {meta.timeZone}
      </p>
      <CrewWarnings warnings={plan.warnings} />
      <PlanFigures summary={plan.summary} />
      <PlanHoldOffs holdOffs={plan.holdOffs} cautionTexts={cautionTexts} />
      <PlanTimeline plan={plan} cautionTexts={cautionTexts} />
    </div>
  );
});
