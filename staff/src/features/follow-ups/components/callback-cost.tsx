import type { FollowUp } from "#shared/schemas/follow-ups";
import { formatHours, formatMoney, outcomeLabels } from "../lib/labels.ts";

/** A callback's cost and outcome in a line or two; nothing for other follow-ups. */
export function CallbackCost({ followUp }: { followUp: FollowUp }) {
  if (!followUp.isCallback) return <span className="text-ink-soft">—</span>;
  if (followUp.labourHours === null && followUp.materialsCost === null) {
    return <span className="text-ink-soft">Cost not recorded yet</span>;
  }
  const parts = [
    followUp.labourHours !== null ? formatHours(followUp.labourHours) : "hours not recorded",
    followUp.materialsCost !== null ? `${formatMoney(followUp.materialsCost)} materials` : null,
  ].filter(Boolean);
  return (
    <span>
      {parts.join(" · ")}
      <br />
      <span className="text-ink-soft">{outcomeLabels[followUp.outcome]}</span>
    </span>
  );
}
