import type { PlanContext } from "../context.ts";
import { formatNumber } from "../format.ts";
import { SINGLE_FEEDING_N } from "../tables/feeding.ts";
import type { WarningFinding } from "../types.ts";
import { nitrogenLbPer1000 } from "./feeding.ts";

/** Rates are typed to two decimals; a hair over the limit from rounding is not a warning. */
const ROUNDING = 0.005;

/**
 * For the crew: everything spread at one visit is one application, and a
 * single application above the usual ¾–1 lb N per 1,000 ft² (University of
 * Minnesota Extension, published) is flagged whatever the product or its
 * tick boxes say. On new seed it is a risk, elsewhere a caution.
 */
export function singleApplicationNitrogenWarning(ctx: PlanContext): WarningFinding | null {
  const products = ctx.input.visit.products;
  const perProduct = products.map((p) => ({ name: p.name, n: nitrogenLbPer1000(p) }));
  const total = perProduct.reduce((sum, p) => sum + p.n, 0);
  if (total <= SINGLE_FEEDING_N.maxLbPer1000 + ROUNDING) return null;
  const parts = perProduct.filter((p) => p.n > 0).map((p) => `${p.name}: ${formatNumber(p.n, 2)} lb`);
  return {
    code: "nitrogen_above_single_application",
    severity: ctx.seeding ? "risk" : "caution",
    message:
      `This visit put down ${formatNumber(total, 2)} lb of nitrogen per 1,000 ft² in one application` +
      `${parts.length > 1 ? ` (${parts.join("; ")})` : ""}, above the usual ${SINGLE_FEEDING_N.minLbPer1000}–${SINGLE_FEEDING_N.maxLbPer1000} lb.`,
    reason:
      "More nitrogen than one feeding needs can burn the grass, forces soft top growth at the roots' expense, and what the grass cannot take up washes away.",
    source: SINGLE_FEEDING_N.source,
    provenance: SINGLE_FEEDING_N.provenance,
  };
}

export function nitrogenWarnings(ctx: PlanContext): WarningFinding[] {
  const warning = singleApplicationNitrogenWarning(ctx);
  return warning ? [warning] : [];
}
