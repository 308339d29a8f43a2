import { CalculatorInputError, requireNonNegative, requirePositive } from "./errors.ts";
import { IN3_PER_ML } from "./units.ts";

/**
 * The auditor's "3.66" is not a magic number: it turns mL caught per minute
 * into inches per hour, i.e. 60 min/h × 0.0610237 in³/mL. Deriving it keeps it
 * honest (Irrigation Association formula, recalled from memory; checked here
 * by unit conversion).
 */
export const CATCH_CAN_CONSTANT = 60 * IN3_PER_ML;

/** Opening area of a round catch can, in² (CSU Chico DU calculator notes). */
export function openingAreaIn2(diameterIn: number): number {
  requirePositive("diameterIn", diameterIn);
  return Math.PI * (diameterIn / 2) ** 2;
}

/** Precipitation rate (in/h) from the mean catch of a timed catch-can run. */
export function precipitationRateInPerHour(meanCatchMl: number, openingAreaSqIn: number, minutes: number): number {
  requireNonNegative("meanCatchMl", meanCatchMl);
  requirePositive("openingAreaIn2", openingAreaSqIn);
  requirePositive("minutes", minutes);
  return (CATCH_CAN_CONSTANT * meanCatchMl) / (openingAreaSqIn * minutes);
}

/**
 * Low-quarter distribution uniformity: mean of the lowest quarter ÷ mean of all.
 * "Quarter" is rounded to the nearest whole can (at least one), because audits
 * rarely use a multiple of four cans.
 */
export function lowQuarterDU(catches: readonly number[]): number {
  if (!Array.isArray(catches) || catches.length < 4) {
    throw new CalculatorInputError("catches", "need at least 4 catch-can readings");
  }
  catches.forEach((c, i) => requireNonNegative(`catches.${i}`, c));
  const sorted = [...catches].sort((a, b) => a - b);
  const quarterCount = Math.max(1, Math.round(sorted.length / 4));
  const mean = (xs: readonly number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
  const meanAll = mean(sorted);
  if (meanAll === 0) throw new CalculatorInputError("catches", "all cans are empty; run the test longer");
  return mean(sorted.slice(0, quarterCount)) / meanAll;
}

/** Run time per cycle to put down the wanted depth at a known precipitation rate. */
export function minutesPerCycle(depthIn: number, prInPerHour: number): number {
  requirePositive("depthIn", depthIn);
  requirePositive("prInPerHour", prInPerHour);
  return (depthIn / prInPerHour) * 60;
}
