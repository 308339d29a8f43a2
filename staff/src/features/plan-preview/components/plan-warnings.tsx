import type { PlanWarning, WarningSeverity } from "#shared/engine/index";
import { SEVERITY_LABELS } from "../lib/labels.ts";
import { SourceLine } from "./source-line.tsx";

const SEVERITY_STYLES: Record<WarningSeverity, string> = {
  risk: "border-rust-700 bg-rust-50",
  caution: "border-straw-800 bg-straw-50",
  info: "border-pine-700 bg-pine-50",
};

const SEVERITY_TEXT: Record<WarningSeverity, string> = {
  risk: "text-rust-700",
  caution: "text-straw-800",
  info: "text-pine-800",
};

const ORDER: readonly WarningSeverity[] = ["risk", "caution", "info"];

/** Risks first, then cautions, then notes; the word says the severity, colour only repeats it. */
export function PlanWarnings({ warnings }: { warnings: readonly PlanWarning[] }) {
  const sorted = [...warnings].sort((a, b) => ORDER.indexOf(a.severity) - ORDER.indexOf(b.severity));
  return (
    <section aria-labelledby="plan-warnings-heading" className="flex flex-col gap-3">
      <h3 id="plan-warnings-heading" className="text-xl text-pine-900">
        Warnings
      </h3>
      {sorted.length === 0 ? (
        <p className="text-ink-soft">No warnings for this visit.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {sorted.map((warning) => (
            <li key={warning.code} data-testid="plan-warning" data-severity={warning.severity} className={`rounded-lg border-l-4 p-4 ${SEVERITY_STYLES[warning.severity]}`}>
              <p className={`font-bold ${SEVERITY_TEXT[warning.severity]}`}>
                {SEVERITY_LABELS[warning.severity]}: <span className="font-semibold">{warning.message}</span>
              </p>
              <p className="mt-1">{warning.reason}</p>
              <SourceLine source={warning.source} provenance={warning.provenance} className="mt-1" />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
