import { parsePlanInput, visitWarnings, type PlanWarning } from "#shared/engine/index";
import type { PropertyDetail } from "#shared/schemas/properties";
import type { VisitFormValues } from "./form-values.ts";
import { toLawnOnSite } from "./lawn-on-site.ts";
import { parseNumber } from "./numbers.ts";
import { priorPreEmergentBody } from "./prior-pre-emergent.ts";

export type VisitWarningsState =
  | { state: "no_lawn" }
  /** Something the engine needs is missing or half-typed; the form's own messages say what on save. */
  | { state: "incomplete" }
  | { state: "ready"; warnings: PlanWarning[] };

class Incomplete extends Error {}

const figure = (text: string): number => {
  const n = parseNumber(text);
  if (n === null || Number.isNaN(n)) throw new Incomplete();
  return n;
};

/**
 * The warnings the saved visit's plan would carry, worked out in the browser by the same engine
 * the server runs, against the chosen lawn's facts: so the technician can still change a figure.
 */
export function warningsForVisit(values: VisitFormValues, property: PropertyDetail | undefined): VisitWarningsState {
  if (!property) return { state: "no_lawn" };
  const v = values.visit;
  let raw;
  try {
    const rate = parseNumber(v.seedRateLbPer1000);
    if (Number.isNaN(rate)) throw new Incomplete();
    raw = {
      visit: {
        date: v.date,
        services: v.services,
        seedMix: v.seedMix.map((row) => ({
          species: row.species,
          percent: figure(row.percent),
          purityPct: figure(row.purityPct),
          germinationPct: figure(row.germinationPct),
        })),
        seedRateLbPer1000: rate ?? undefined,
        areaFt2: figure(v.areaFt2),
        products: v.products.map((row) => ({
          name: row.name,
          analysis: { n: figure(row.analysis.n), p: figure(row.analysis.p), k: figure(row.analysis.k) },
          rateLbPer1000: figure(row.rateLbPer1000),
          quickReleaseN: row.quickReleaseN,
          organic: row.organic || undefined,
        })),
        ...(v.soilTestCallsForPhosphorus ? { soilTestCallsForPhosphorus: true } : {}),
        priorPreEmergent: priorPreEmergentBody(v),
      },
      // The condition, slope and shade picked on the form win over the record, as they will once saved.
      property: { ...property.lawn, ...toLawnOnSite(values.lawn), timeZone: property.timeZone },
      ...(property.placeRules ? { placeRules: property.placeRules } : {}),
    };
  } catch (error) {
    if (error instanceof Incomplete) return { state: "incomplete" };
    throw error;
  }
  const parsed = parsePlanInput(raw);
  return parsed.ok ? { state: "ready", warnings: visitWarnings(parsed.value) } : { state: "incomplete" };
}
