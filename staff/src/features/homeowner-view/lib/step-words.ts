import type { StepChange } from "#shared/schemas/homeowner-view";
import type { StoredStep } from "#shared/schemas/plans";

/** "06:00" → "6:00 am". */
function clock(hhmm: string): string {
  const [h, m] = hhmm.split(":").map(Number) as [number, number];
  return `${h % 12 === 0 ? 12 : h % 12}:${String(m).padStart(2, "0")} ${h < 12 ? "am" : "pm"}`;
}

export const displayTimes = (times: readonly string[]) => times.map(clock).join(", ");

const whoLabel = (change: StepChange | undefined): string => {
  if (!change || change.byRole === null) return "";
  if (change.byRole === "customer") return " by the homeowner";
  return ` by ${change.byName ?? "staff"} (staff)`;
};

/**
 * "Done Sep 2, 8:00 am by the homeowner", on the lawn's clock: staff may sit in another zone,
 * and the homeowner's day is the one that matters.
 */
export function settledLine(step: StoredStep, change: StepChange | undefined, timeZone: string): string {
  const verb = step.state === "done" ? "Done" : "Skipped";
  const at = step.stateChangedAt ?? change?.changedAt ?? null;
  if (!at) return `${verb}${whoLabel(change)}`;
  const when = new Intl.DateTimeFormat("en-US", { month: "short", day: "numeric", hour: "numeric", minute: "2-digit", timeZone }).format(new Date(at));
  return `${verb} ${when}${whoLabel(change)}`;
}
