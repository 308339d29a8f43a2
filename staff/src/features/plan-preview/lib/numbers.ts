/** Figures for people: at most `digits` decimals, thousands separated, no trailing zeros. */
export function formatFigure(value: number, digits = 1): string {
  return value.toLocaleString("en-US", { maximumFractionDigits: digits });
}

/** 0.882 → "88.2 %". */
export function formatPercent(fraction: number, digits = 1): string {
  return `${formatFigure(fraction * 100, digits)} %`;
}
