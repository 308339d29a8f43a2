import { useSyncExternalStore } from "react";
import { ft2ToM2, inToMm, lbPer1000Ft2ToGPerM2 } from "#shared/calculators/units";
import { rememberUnits, storedUnits, type Units } from "../../i18n/language.ts";

/**
 * US or metric, as a tiny store: Settings changes it and every open screen follows at once.
 * The server's saved choice is applied into it by the signed-in layout.
 */
const listeners = new Set<() => void>();
let current: Units = typeof window === "undefined" ? "us" : storedUnits();

export function setUnits(units: Units) {
  if (units === current) return;
  current = units;
  rememberUnits(units);
  listeners.forEach((notify) => notify());
}

export function useUnits(): Units {
  return useSyncExternalStore(
    (notify) => {
      listeners.add(notify);
      return () => listeners.delete(notify);
    },
    () => current,
    () => "us" as Units,
  );
}

function round(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  return Math.round(value * factor) / factor;
}

/** Mower height: "3 in" or "7.5 cm" (mowers are marked in cm in metric countries). */
export function formatHeight(inches: number, units: Units): string {
  return units === "metric" ? `${round(inToMm(inches) / 10, 1)} cm` : `${round(inches, 2)} in`;
}

export function formatArea(ft2: number, units: Units, language: string): string {
  const number = new Intl.NumberFormat(language, { maximumFractionDigits: 0 });
  return units === "metric" ? `${number.format(ft2ToM2(ft2))} m²` : `${number.format(ft2)} ft²`;
}

export function formatRate(lbPer1000: number, units: Units, language: string): string {
  const number = new Intl.NumberFormat(language, { maximumFractionDigits: 1 });
  return units === "metric" ? `${number.format(lbPer1000Ft2ToGPerM2(lbPer1000))} g/m²` : `${number.format(lbPer1000)} lb / 1,000 ft²`;
}
