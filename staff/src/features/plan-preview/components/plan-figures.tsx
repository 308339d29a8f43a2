import type { ReactNode } from "react";
import type { CalculatorSummary } from "#shared/engine/index";
import { inToMm, lbPer1000Ft2ToGPerM2, lbToKg } from "#shared/calculators/index";
import { formatFigure, formatPercent } from "../lib/numbers.ts";
import { speciesLabel } from "../lib/labels.ts";
import { FigureList } from "./figure-list.tsx";

type Npk = CalculatorSummary["nutrientsTotal"];

type SeedRateBasis = NonNullable<CalculatorSummary["seed"]>["expectedRangeLbPer1000"]["basis"];
const SEED_RATE_BASIS_LABEL: Record<SeedRateBasis, string> = {
  new_seeding: "new seeding",
  overseeding: "overseeding",
  winter_overseeding: "winter ryegrass on a warm-season lawn",
};

const lb = (value: number, digits = 1) => `${formatFigure(value, digits)} lb (${formatFigure(lbToKg(value), digits)} kg)`;
const npk = ({ n, p, k }: Npk, digits = 2) => `${formatFigure(n, digits)} – ${formatFigure(p, digits)} – ${formatFigure(k, digits)} lb`;
const npkKg = ({ n, p, k }: Npk) => `${formatFigure(lbToKg(n), 2)} – ${formatFigure(lbToKg(p), 2)} – ${formatFigure(lbToKg(k), 2)} kg`;

/** The calculators' figures behind the plan: seed, nutrients, products and watering, in US and metric units. */
export function PlanFigures({ summary }: { summary: CalculatorSummary }) {
  const { seed } = summary;
  return (
    <section aria-labelledby="plan-figures-heading" className="flex flex-col gap-4">
      <h3 id="plan-figures-heading" className="text-xl text-pine-900">
        Figures
      </h3>
      <FigureList items={[{ label: "Lawn area", value: `${formatFigure(summary.areaFt2, 0)} ft² (${formatFigure(summary.areaM2, 0)} m²)` }]} />

      <FigureGroup title="Seed">
        {seed ? (
          <>
            <FigureList
              items={[
                {
                  label: "Seed rate",
                  value: `${formatFigure(seed.rateLbPer1000, 2)} lb per 1,000 ft² (${formatFigure(seed.rateGPerM2, 1)} g/m²)`,
                },
                {
                  label: `Usual rate for this mix (${SEED_RATE_BASIS_LABEL[seed.expectedRangeLbPer1000.basis]})`,
                  value: `${formatFigure(seed.expectedRangeLbPer1000.min, 2)}–${formatFigure(seed.expectedRangeLbPer1000.max, 2)} lb per 1,000 ft²`,
                },
                { label: "Pure live seed (PLS)", value: formatPercent(seed.plsFraction) },
                { label: "PLS rate", value: `${formatFigure(seed.plsRateLbPer1000, 2)} lb per 1,000 ft²` },
                { label: "Bulk seed for the area", value: lb(seed.bulkSeedLb) },
                { label: "Pure live seed for the area", value: lb(seed.pureLiveSeedLb) },
                {
                  label: "Seeds per ft²",
                  value: seed.seedsPerSqFt === null ? "Not published for every species in the mix" : formatFigure(seed.seedsPerSqFt, 0),
                },
              ]}
            />
            {seed.perSpecies.length > 1 && (
              <ul className="flex flex-col gap-1 text-base">
                {seed.perSpecies.map((entry) => (
                  <li key={entry.species}>
                    <span className="font-semibold">{speciesLabel(entry.species)}</span> ({formatFigure(entry.percent)} %): {lb(entry.bulkLb)} bulk, PLS{" "}
                    {formatPercent(entry.plsFraction)}
                    {entry.seedsPerSqFt !== null && `, ${formatFigure(entry.seedsPerSqFt, 0)} seeds per ft²`}
                  </li>
                ))}
              </ul>
            )}
          </>
        ) : (
          <p className="text-ink-soft">No seed on this visit.</p>
        )}
      </FigureGroup>

      <FigureGroup title="Nutrients (N-P-K)">
        <FigureList
          items={[
            { label: "Per 1,000 ft²", value: npk(summary.nutrientsPer1000) },
            { label: "For the whole area", value: npk(summary.nutrientsTotal) },
            { label: "For the whole area, metric", value: npkKg(summary.nutrientsTotal) },
          ]}
        />
      </FigureGroup>

      <FigureGroup title="Products">
        {summary.products.length === 0 ? (
          <p className="text-ink-soft">No products on this visit.</p>
        ) : (
          summary.products.map((product, i) => (
            <div key={`${i}-${product.name}`} data-testid="product-figures" className="flex flex-col gap-1">
              <p className="font-semibold">{product.name}</p>
              <FigureList
                items={[
                  {
                    label: "Rate",
                    value: `${formatFigure(product.rateLbPer1000, 2)} lb per 1,000 ft² (${formatFigure(lbPer1000Ft2ToGPerM2(product.rateLbPer1000), 1)} g/m²)`,
                  },
                  { label: "Total for the area", value: `${formatFigure(product.totalLb, 1)} lb (${formatFigure(product.totalKg, 1)} kg)` },
                  { label: "N-P-K delivered per 1,000 ft²", value: npk(product.nutrientsPer1000) },
                ]}
              />
            </div>
          ))
        )}
      </FigureGroup>

      <FigureGroup title="Watering">
        <FigureList
          items={[
            {
              label: "Precipitation rate used",
              value: `${formatFigure(summary.precipitationRateInPerHour, 2)} in/h (${formatFigure(inToMm(summary.precipitationRateInPerHour), 1)} mm/h)`,
            },
            { label: "Where it comes from", value: rateOrigin(summary) },
            {
              label: "Minutes per watering cycle",
              value: summary.germinationMinutesPerCycle === null ? "No germination watering" : `${formatFigure(summary.germinationMinutesPerCycle, 0)} min`,
            },
          ]}
        />
      </FigureGroup>
    </section>
  );
}

function FigureGroup({ title, children }: { title: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-2 border-t border-line pt-3">
      <h4 className="font-heading text-lg font-bold text-pine-900">{title}</h4>
      {children}
    </div>
  );
}

/** A default is said to be one, with the sprinkler type's typical range when that is what it rests on. */
function rateOrigin(summary: CalculatorSummary): string {
  const typical = summary.precipitationRateDefault;
  if (summary.precipitationRateMeasured || typical === null) return "Measured at this property";
  if (typical.basis === "program") return "Program default (not measured)";
  return `Default for this sprinkler type, typically ${formatFigure(typical.minInPerHour, 2)}–${formatFigure(typical.maxInPerHour, 2)} in/h (${typical.provenance}; not measured)`;
}
