import type { CautionId, Why } from "#shared/engine/index";
import { SourceLine } from "./source-line.tsx";

export interface StepWhyProps {
  /** Names the step for screen readers, since every disclosure is labelled "Why?". */
  stepTitle: string;
  why: Why;
  cautionIds: readonly CautionId[];
  cautionTexts: ReadonlyMap<CautionId, string>;
}

/** The agronomy behind a step, one tap away: reason, source, how sure we are, and the cautions that go with it. */
export function StepWhy({ stepTitle, why, cautionIds, cautionTexts }: StepWhyProps) {
  return (
    <details className="group mt-1">
      <summary className="inline-flex min-h-11 cursor-pointer items-center font-semibold text-pine-700 underline underline-offset-4">
        Why?<span className="sr-only"> ({stepTitle})</span>
      </summary>
      <div className="mt-1 flex flex-col gap-1 border-l-2 border-pine-700 pl-3">
        <p>{why.text}</p>
        <SourceLine source={why.source} provenance={why.provenance} />
        {cautionIds.length > 0 && (
          <ul className="mt-1 flex flex-col gap-1 text-base">
            {cautionIds.map((id) => (
              <li key={id} className="text-loam-700">
                <span aria-hidden="true">! </span>
                {cautionTexts.get(id) ?? id}
              </li>
            ))}
          </ul>
        )}
      </div>
    </details>
  );
}
