import { useId } from "react";
import type { PlanWarning, Provenance, WarningSeverity } from "#shared/engine/index";

const SEVERITY_LABELS: Record<WarningSeverity, string> = { risk: "Risk", caution: "Caution", info: "Note" };
const PROVENANCE_LABELS: Record<Provenance, string> = {
  published: "published source",
  "common practice": "common trade practice",
  "from memory": "recalled, not re-read",
};
const SEVERITY_STYLES: Record<WarningSeverity, string> = {
  risk: "border-rust-700 bg-rust-50",
  caution: "border-straw-800 bg-straw-50",
  info: "border-pine-700 bg-pine-50",
};
const SEVERITY_TEXT: Record<WarningSeverity, string> = { risk: "text-rust-700", caution: "text-straw-800", info: "text-pine-800" };
const ORDER: readonly WarningSeverity[] = ["risk", "caution", "info"];

type Warning = Pick<PlanWarning, "code" | "audience" | "severity" | "message" | "reason" | "source" | "provenance">;

const bySeverity = (warnings: readonly Warning[]) => [...warnings].sort((a, b) => ORDER.indexOf(a.severity) - ORDER.indexOf(b.severity));

/**
 * The engine's warnings as staff see them: the crew's first, risks before cautions before notes
 * (the word says the severity, colour only repeats it); then, if asked, what the homeowner is
 * told about the same findings, so nobody has to guess what the customer reads.
 */
export function CrewWarnings({
  warnings,
  title = "Warnings",
  emptyText = "No warnings for this visit.",
  showHomeowner = true,
  live = false,
  headingLevel = 3,
}: {
  warnings: readonly Warning[];
  title?: string;
  emptyText?: string;
  showHomeowner?: boolean;
  /** Announce changes to screen readers, for a list that follows what is being typed. */
  live?: boolean;
  headingLevel?: 2 | 3 | 4;
}) {
  const headingId = useId();
  const Heading = (["h2", "h3", "h4"] as const)[headingLevel - 2]!;
  const crew = bySeverity(warnings.filter((w) => w.audience === "crew"));
  const homeowner = bySeverity(warnings.filter((w) => w.audience === "homeowner"));
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <Heading id={headingId} className="text-xl text-pine-900">
        {title}
      </Heading>
      <div aria-live={live ? "polite" : undefined} className="flex flex-col gap-3">
        {crew.length === 0 ? (
          <p className="text-ink-soft">{emptyText}</p>
        ) : (
          <ul className="flex flex-col gap-3">
            {crew.map((warning) => (
              <WarningItem key={warning.code} warning={warning} testId="plan-warning" />
            ))}
          </ul>
        )}
        {showHomeowner && homeowner.length > 0 && (
          <details className="rounded-lg border border-line p-3">
            <summary className="min-h-11 cursor-pointer content-center font-semibold">What the homeowner is told ({homeowner.length})</summary>
            <ul className="mt-2 flex flex-col gap-3">
              {homeowner.map((warning) => (
                <WarningItem key={warning.code} warning={warning} testId="homeowner-warning" />
              ))}
            </ul>
          </details>
        )}
      </div>
    </section>
  );
}

function WarningItem({ warning, testId }: { warning: Warning; testId: string }) {
  return (
    <li data-testid={testId} data-code={warning.code} data-severity={warning.severity} className={`rounded-lg border-l-4 p-4 ${SEVERITY_STYLES[warning.severity]}`}>
      <p className={`font-bold ${SEVERITY_TEXT[warning.severity]}`}>
        {SEVERITY_LABELS[warning.severity]}: <span className="font-semibold">{warning.message}</span>
      </p>
      <p className="mt-1">{warning.reason}</p>
      <p className="mt-1 text-base text-ink-soft">
        <span className="font-semibold">Source:</span> {warning.source} <span className="whitespace-nowrap">({PROVENANCE_LABELS[warning.provenance]})</span>
      </p>
    </li>
  );
}
