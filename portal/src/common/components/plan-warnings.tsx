import { useTranslation } from "react-i18next";
import type { StoredPlan } from "#shared/schemas/plans";
import { WhyDetails } from "./why-details.tsx";

const tone = {
  risk: "border-rust-700 bg-rust-50 text-rust-700",
  caution: "border-straw-800 bg-straw-50 text-straw-800",
  info: "border-line-strong bg-surface text-ink",
} as const;

/** What the homeowner should know about the plan as a whole (e.g. frost coming soon); the API sends only warnings written for them. */
export function PlanWarnings({ warnings }: { warnings: StoredPlan["warnings"] }) {
  const { t } = useTranslation();
  return (
    <ul className="space-y-3">
      {warnings.map((warning) => (
        <li key={warning.code} className={`rounded-xl border-l-4 p-4 ${tone[warning.severity]}`}>
          <p className="text-sm font-bold tracking-wide uppercase">{t(`warnings.severity.${warning.severity}`)}</p>
          <p className="mt-1 text-lg font-semibold">{warning.message}</p>
          <WhyDetails text={warning.reason} source={warning.source} provenance={warning.provenance} cautions={[]} />
        </li>
      ))}
    </ul>
  );
}
