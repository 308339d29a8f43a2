import { useTranslation } from "react-i18next";
import type { StoredHoldOff } from "#shared/schemas/plans";
import { cautionTexts } from "../lib/caution-texts.ts";
import { formatShortDate } from "../lib/dates.ts";
import { WhyDetails } from "./why-details.tsx";

const knownKinds = new Set(["weed_and_feed", "broadleaf_herbicide", "crabgrass_pre_emergent", "high_n_quick_release", "heavy_traffic", "new_seed"]);

export interface HoldOffListProps {
  holdOffs: readonly StoredHoldOff[];
  cautions: readonly { id: string; text: string }[];
}

/** "No weed-and-feed until Jan 24", each with its reason one tap away. */
export function HoldOffList({ holdOffs, cautions }: HoldOffListProps) {
  const { t, i18n } = useTranslation();
  return (
    <ul className="divide-y divide-straw-800/30 rounded-xl border-2 border-straw-800 bg-straw-50">
      {holdOffs.map((holdOff) => {
        const until = formatShortDate(holdOff.end, i18n.language);
        const kind = knownKinds.has(holdOff.kind) ? holdOff.kind : "other";
        return (
          <li key={holdOff.kind} className="p-4">
            <p className="flex items-start gap-2 text-lg font-bold text-straw-800">
              <NoSign />
              <span>{t(`holdOff.${kind as "other"}`, { until })}</span>
            </p>
            <WhyDetails text={holdOff.why} source={holdOff.source} provenance={holdOff.provenance} cautions={cautionTexts(holdOff.cautions, cautions)} />
          </li>
        );
      })}
    </ul>
  );
}

function NoSign() {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" focusable="false" className="mt-1 size-5 shrink-0" fill="none" stroke="currentColor" strokeWidth="2.5">
      <circle cx="12" cy="12" r="9" />
      <path d="M5.6 5.6l12.8 12.8" />
    </svg>
  );
}
