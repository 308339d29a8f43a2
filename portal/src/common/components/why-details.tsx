import { useTranslation } from "react-i18next";
import type { z } from "zod";
import type { whySchema } from "#shared/schemas/plans";

type Provenance = z.infer<typeof whySchema>["provenance"];

export interface WhyDetailsProps {
  text: string;
  source: string;
  provenance: Provenance;
  cautions: readonly string[];
}

const disclosureSummary =
  "inline-flex min-h-11 min-w-11 cursor-pointer list-none items-center gap-2 font-semibold text-pine-700 underline underline-offset-4 [&::-webkit-details-marker]:hidden";

/** Turns when its own disclosure opens; `turn` is a whole class name so Tailwind sees it. */
function Chevron({ turn }: { turn: "group-open:rotate-90" | "group-open/sources:rotate-90" }) {
  return (
    <span aria-hidden="true" className={`inline-block transition-transform ${turn}`}>
      ▸
    </span>
  );
}

/**
 * The agronomy one tap away (DESIGN.md §9): first the reason in plain words and what to watch out
 * for; where it comes from sits one more tap away under "Sources", for those who want it.
 */
export function WhyDetails({ text, source, provenance, cautions }: WhyDetailsProps) {
  const { t } = useTranslation();
  return (
    <details className="group mt-2 print:hidden">
      <summary className={disclosureSummary}>
        <Chevron turn="group-open:rotate-90" />
        {t("why.summary")}
      </summary>
      <div className="space-y-2 rounded-lg border border-line bg-canvas p-3">
        <p>{text}</p>
        {cautions.length > 0 && (
          <div>
            <p className="font-semibold text-straw-800">{t("why.takeCare")}</p>
            <ul className="mt-1 list-disc space-y-1 pl-5">
              {cautions.map((caution) => (
                <li key={caution}>{caution}</li>
              ))}
            </ul>
          </div>
        )}
        <details className="group/sources">
          <summary className={`${disclosureSummary} text-base`}>
            <Chevron turn="group-open/sources:rotate-90" />
            {t("why.sources")}
          </summary>
          <SourceLine source={source} provenance={provenance} />
        </details>
      </div>
    </details>
  );
}

/*
 * A value still marked "from memory" was recalled, not re-read, so it is never shown to a
 * homeowner as a citation: naming a publication nobody has checked would lend it an authority it
 * doesn't have yet. The homeowner reads that it is common practice being confirmed; staff see the
 * recalled source on their "Sources to check" page until a published one replaces it.
 */
function SourceLine({ source, provenance }: { source: string; provenance: Provenance }) {
  const { t } = useTranslation();
  if (provenance === "from memory") return <p className="text-base text-ink-soft">{t("why.beingChecked")}</p>;
  return (
    <p className="text-base text-ink-soft">
      <span className="font-semibold">{t("why.source")}</span> {source}{" "}
      <span className="whitespace-nowrap">({t(provenance === "published" ? "why.provenance.published" : "why.provenance.commonPractice")})</span>
    </p>
  );
}
