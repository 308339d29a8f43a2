import type { CautionId, HoldOff } from "#shared/engine/index";
import { HOLD_OFF_LABELS } from "../lib/labels.ts";
import { formatDayRange } from "../lib/local-dates.ts";
import { StepWhy } from "./step-why.tsx";

/** What the homeowner must not do, and until when. */
export function PlanHoldOffs({ holdOffs, cautionTexts }: { holdOffs: readonly HoldOff[]; cautionTexts: ReadonlyMap<CautionId, string> }) {
  return (
    <section aria-labelledby="plan-hold-offs-heading" className="flex flex-col gap-3">
      <h3 id="plan-hold-offs-heading" className="text-xl text-pine-900">
        Hold-off windows
      </h3>
      {holdOffs.length === 0 ? (
        <p className="text-ink-soft">Nothing to hold off on after this visit.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {holdOffs.map((holdOff) => (
            <li key={holdOff.kind} className="rounded-lg border border-line bg-surface p-3">
              <p className="font-semibold">{HOLD_OFF_LABELS[holdOff.kind]}</p>
              <p className="text-loam-700">{formatDayRange(holdOff.start, holdOff.end)}</p>
              <StepWhy
                stepTitle={HOLD_OFF_LABELS[holdOff.kind]}
                why={{ text: holdOff.why, source: holdOff.source, provenance: holdOff.provenance }}
                cautionIds={holdOff.cautions}
                cautionTexts={cautionTexts}
              />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
