import { requireFinite, requireNonNegative } from "./errors.ts";

/*
 * Exact definitions from NIST SP 811 (Appendix B): everything else is derived
 * from these three numbers, so rounding never compounds across conversions.
 */
export const KG_PER_LB = 0.45359237;
export const M_PER_FT = 0.3048;
export const MM_PER_IN = 25.4;

export const M2_PER_FT2 = M_PER_FT * M_PER_FT;
export const G_PER_LB = KG_PER_LB * 1000;
/** 1 in³ = (2.54 cm)³ = 16.387064 cm³, and 1 mL = 1 cm³. */
export const ML_PER_IN3 = (MM_PER_IN / 10) ** 3;
export const IN3_PER_ML = 1 / ML_PER_IN3;
const M2_PER_HA = 10_000;
const FT2_PER_THOUSAND = 1000;

export function ft2ToM2(ft2: number): number {
  return requireNonNegative("ft2", ft2) * M2_PER_FT2;
}
export function m2ToFt2(m2: number): number {
  return requireNonNegative("m2", m2) / M2_PER_FT2;
}
export function lbToKg(lb: number): number {
  return requireNonNegative("lb", lb) * KG_PER_LB;
}
export function kgToLb(kg: number): number {
  return requireNonNegative("kg", kg) / KG_PER_LB;
}
export function inToMm(inches: number): number {
  return requireNonNegative("in", inches) * MM_PER_IN;
}
export function mmToIn(mm: number): number {
  return requireNonNegative("mm", mm) / MM_PER_IN;
}

/** lb per 1,000 ft² → g/m²: 1 lb/1,000 ft² ≈ 4.8824 g/m² (NIST SP 811 constants). */
export function lbPer1000Ft2ToGPerM2(rate: number): number {
  requireNonNegative("lbPer1000Ft2", rate);
  return (rate * G_PER_LB) / (FT2_PER_THOUSAND * M2_PER_FT2);
}
export function gPerM2ToLbPer1000Ft2(rate: number): number {
  requireNonNegative("gPerM2", rate);
  return (rate * FT2_PER_THOUSAND * M2_PER_FT2) / G_PER_LB;
}
/** lb per 1,000 ft² → kg/ha: 1 lb/1,000 ft² ≈ 48.824 kg/ha. */
export function lbPer1000Ft2ToKgPerHa(rate: number): number {
  requireNonNegative("lbPer1000Ft2", rate);
  return (rate * KG_PER_LB * M2_PER_HA) / (FT2_PER_THOUSAND * M2_PER_FT2);
}
export function kgPerHaToLbPer1000Ft2(rate: number): number {
  requireNonNegative("kgPerHa", rate);
  return (rate * FT2_PER_THOUSAND * M2_PER_FT2) / (KG_PER_LB * M2_PER_HA);
}

/** Temperatures may be negative, so only finiteness is checked. */
export function fahrenheitToCelsius(f: number): number {
  return ((requireFinite("fahrenheit", f) - 32) * 5) / 9;
}
export function celsiusToFahrenheit(c: number): number {
  return (requireFinite("celsius", c) * 9) / 5 + 32;
}
