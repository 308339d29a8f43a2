import { bagsNeeded, nutrientsDelivered, pureLiveSeed, totalProduct } from "#shared/calculators/index";
import type { ProductRow, SeedRow } from "./form-values.ts";
import { parseNumber } from "./numbers.ts";

/*
 * Live amounts from the shared calculators. The calculators refuse bad input by throwing
 * (a NaN must never reach a plan), so while a box is half-typed the figure is simply null.
 */
function attempt<T>(compute: () => T): T | null {
  try {
    return compute();
  } catch {
    return null;
  }
}

const num = (text: string) => {
  const n = parseNumber(text);
  return n === null || Number.isNaN(n) ? null : n;
};

/** Pure live seed of one tag line, as a fraction (purity × germination). */
export function seedRowPls(row: SeedRow): number | null {
  const purity = num(row.purityPct);
  const germination = num(row.germinationPct);
  return purity === null || germination === null ? null : attempt(() => pureLiveSeed(purity, germination));
}

export interface SeedTotals {
  bulkLb: number;
  bags: number | null;
  /** Pounds of pure live seed spread, over the mix's shares; null until every line has a tag. */
  pureLiveSeedLb: number | null;
}

export function seedTotals(rows: SeedRow[], rateText: string, areaText: string, bagText: string): SeedTotals | null {
  const rate = num(rateText);
  const area = num(areaText);
  if (rate === null || area === null) return null;
  const bulkLb = attempt(() => totalProduct(rate, area));
  if (bulkLb === null) return null;
  const bag = num(bagText);
  const bags = bag === null ? null : attempt(() => bagsNeeded(bulkLb, bag));
  let pureLiveSeedLb: number | null = rows.length ? 0 : null;
  for (const row of rows) {
    const pls = seedRowPls(row);
    const share = num(row.percent);
    if (pls === null || share === null || pureLiveSeedLb === null) {
      pureLiveSeedLb = null;
      break;
    }
    pureLiveSeedLb += bulkLb * (share / 100) * pls;
  }
  return { bulkLb, bags, pureLiveSeedLb };
}

export interface ProductFigures {
  totalLb: number;
  bags: number | null;
  nPer1000: number;
  nTotal: number;
  pTotal: number;
  kTotal: number;
}

export function productFigures(row: ProductRow, areaText: string): ProductFigures | null {
  const rate = num(row.rateLbPer1000);
  const area = num(areaText);
  const n = num(row.analysis.n);
  const p = num(row.analysis.p);
  const k = num(row.analysis.k);
  if (rate === null || area === null || n === null || p === null || k === null) return null;
  const totalLb = attempt(() => totalProduct(rate, area));
  const nutrients = attempt(() => nutrientsDelivered({ n, p, k }, rate, area));
  if (totalLb === null || nutrients === null) return null;
  const bag = num(row.bagLb);
  return {
    totalLb,
    bags: bag === null ? null : attempt(() => bagsNeeded(totalLb, bag)),
    nPer1000: nutrients.perThousand.n,
    nTotal: nutrients.total.n,
    pTotal: nutrients.total.p,
    kTotal: nutrients.total.k,
  };
}
