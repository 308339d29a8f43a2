import type { StepChange } from "#shared/schemas/homeowner-view";
import type { StoredStep } from "#shared/schemas/plans";
import { displayTimes, settledLine } from "../lib/step-words.ts";

const stateBadge: Record<StoredStep["state"], { label: string; className: string }> = {
  pending: { label: "To do", className: "bg-canvas text-ink-soft ring-1 ring-line" },
  done: { label: "Done", className: "bg-pine-100 text-pine-900" },
  skipped: { label: "Skipped", className: "bg-straw-50 text-straw-800 ring-1 ring-straw-800" },
};

/** One step as the homeowner reads it, with its state and, for staff, when and by whom it was settled. */
export function StepRow({ step, change, timeZone }: { step: StoredStep; change: StepChange | undefined; timeZone: string }) {
  const badge = stateBadge[step.state];
  return (
    <li className="flex flex-col gap-1 rounded-xl border border-line bg-surface p-4" data-testid={`homeowner-step-${step.id}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h4 className="text-lg font-semibold">
          {step.title}
          {step.times && step.times.length > 0 && <span className="font-normal text-ink-soft"> · {displayTimes(step.times)}</span>}
        </h4>
        <span className={`rounded-md px-2 text-sm font-semibold ${badge.className}`}>{badge.label}</span>
      </div>
      <p>{step.detail}</p>
      {step.state !== "pending" && <p className="text-base text-ink-soft">{settledLine(step, change, timeZone)}</p>}
      {step.skipReason && <p className="text-base">Reason given: “{step.skipReason}”</p>}
    </li>
  );
}
