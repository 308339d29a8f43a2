/** "1,200" or " 3.5 " → number; "" → null; anything else → NaN (so the form can say "Enter a number"). */
export function parseNumber(text: string): number | null {
  const cleaned = text.replace(/,/g, "").trim();
  if (cleaned === "") return null;
  return /^-?\d*\.?\d+$/.test(cleaned) ? Number(cleaned) : Number.NaN;
}

/** Figures for people: at most `digits` decimals, thousands separated. */
export function formatFigure(value: number, digits = 1): string {
  return value.toLocaleString("en-US", { maximumFractionDigits: digits });
}
