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

/** The agronomy one tap away (DESIGN.md §9): the reason, where it comes from, and what to watch out for. */
export function WhyDetails({ text, source, provenance, cautions }: WhyDetailsProps) {
  const { t } = useTranslation();
  return (
    <details className="group mt-2 print:hidden">
      <summary className="inline-flex min-h-11 min-w-11 cursor-pointer list-none items-center gap-2 font-semibold text-pine-700 underline underline-offset-4 [&::-webkit-details-marker]:hidden">
        <span aria-hidden="true" className="inline-block transition-transform group-open:rotate-90">
          ▸
        </span>
        {t("why.summary")}
      </summary>
      <div className="space-y-2 rounded-lg border border-line bg-canvas p-3">
        <p>{text}</p>
        <p className="text-base text-ink-soft">
          <span className="font-semibold">{t("why.source")}</span> {source}{" "}
          <span className="whitespace-nowrap">({t(`why.provenance.${provenanceKey(provenance)}`)})</span>
        </p>
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
      </div>
    </details>
  );
}

function provenanceKey(provenance: Provenance): "published" | "commonPractice" | "fromMemory" {
  if (provenance === "published") return "published";
  return provenance === "common practice" ? "commonPractice" : "fromMemory";
}
