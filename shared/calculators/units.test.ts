import convertUnits from "convert-units";
import { describe, expect, it } from "vitest";
import { CalculatorInputError } from "./errors.ts";
import {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  ft2ToM2,
  gPerM2ToLbPer1000Ft2,
  inToMm,
  kgPerHaToLbPer1000Ft2,
  kgToLb,
  lbPer1000Ft2ToGPerM2,
  lbPer1000Ft2ToKgPerHa,
  lbToKg,
  m2ToFt2,
  mmToIn,
} from "./units.ts";

// convert-units rounds its imperial anchors (453.592 g/lb, 3.28084 ft/m), so agreement
// with it is checked to about 6 significant figures, not exactly.
const relativelyClose = (a: number, b: number, tolerance = 1e-5) =>
  expect(Math.abs(a - b) / Math.abs(b)).toBeLessThan(tolerance);

describe("unit conversions use the exact NIST SP 811 definitions", () => {
  it("1 lb = 0.45359237 kg and 1 in = 25.4 mm exactly", () => {
    expect(lbToKg(1)).toBe(0.45359237);
    expect(inToMm(1)).toBe(25.4);
    expect(ft2ToM2(1)).toBeCloseTo(0.09290304, 15);
  });

  it("1 lb/1,000 ft² = 4.8824 g/m² = 48.824 kg/ha (NIST SP 811)", () => {
    expect(lbPer1000Ft2ToGPerM2(1)).toBeCloseTo(4.8824, 4);
    expect(lbPer1000Ft2ToKgPerHa(1)).toBeCloseTo(48.824, 3);
  });

  it("round-trips every pair", () => {
    expect(m2ToFt2(ft2ToM2(6000))).toBeCloseTo(6000, 9);
    expect(kgToLb(lbToKg(21.4))).toBeCloseTo(21.4, 12);
    expect(mmToIn(inToMm(2.5))).toBeCloseTo(2.5, 12);
    expect(gPerM2ToLbPer1000Ft2(lbPer1000Ft2ToGPerM2(3.57))).toBeCloseTo(3.57, 12);
    expect(kgPerHaToLbPer1000Ft2(lbPer1000Ft2ToKgPerHa(3.57))).toBeCloseTo(3.57, 12);
    expect(celsiusToFahrenheit(fahrenheitToCelsius(50))).toBeCloseTo(50, 12);
  });

  it("50–65 °F is 10–18.3 °C (the cool-season root-growth band, University of Minnesota Extension #764665)", () => {
    expect(fahrenheitToCelsius(50)).toBeCloseTo(10, 12);
    expect(fahrenheitToCelsius(65)).toBeCloseTo(18.333, 3);
  });

  it("refuses negative areas and masses, which have no meaning here", () => {
    expect(() => ft2ToM2(-1)).toThrow(CalculatorInputError);
    expect(() => lbToKg(Number.NaN)).toThrow(CalculatorInputError);
  });
});

describe("cross-check against the convert-units package (independent implementation)", () => {
  it("area, mass and length agree", () => {
    relativelyClose(ft2ToM2(6000), convertUnits(6000).from("ft2").to("m2"));
    relativelyClose(m2ToFt2(500), convertUnits(500).from("m2").to("ft2"));
    relativelyClose(lbToKg(21.4), convertUnits(21.4).from("lb").to("kg"));
    relativelyClose(kgToLb(10), convertUnits(10).from("kg").to("lb"));
    relativelyClose(inToMm(3), convertUnits(3).from("in").to("mm"));
    relativelyClose(mmToIn(50), convertUnits(50).from("mm").to("in"));
  });

  it("lb/1,000 ft² to g/m² and kg/ha agree when built from convert-units' own mass and area", () => {
    const gramsPerLb = convertUnits(1).from("lb").to("g");
    const m2Per1000Ft2 = convertUnits(1000).from("ft2").to("m2");
    const haPer1000Ft2 = convertUnits(1000).from("ft2").to("ha");
    relativelyClose(lbPer1000Ft2ToGPerM2(1), gramsPerLb / m2Per1000Ft2);
    relativelyClose(lbPer1000Ft2ToKgPerHa(1), gramsPerLb / 1000 / haPer1000Ft2);
  });

  it("temperatures agree", () => {
    relativelyClose(fahrenheitToCelsius(65), convertUnits(65).from("F").to("C"));
    relativelyClose(celsiusToFahrenheit(-5), convertUnits(-5).from("C").to("F"));
  });
});
