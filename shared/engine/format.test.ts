import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatDate, formatInches, formatNumber } from "./format.ts";

describe("homeowner number formatting", () => {
  it("groups thousands and trims trailing zeros: 6,000 ft², 21.4 lb, 2.5 in", () => {
    expect(formatNumber(6000, 0)).toBe("6,000");
    expect(formatNumber(21.428, 1)).toBe("21.4");
    expect(formatNumber(1234567.5, 1)).toBe("1,234,567.5");
    expect(formatInches(2.5)).toBe("2.5 in");
    expect(formatInches(3)).toBe("3 in");
  });

  it("matches Intl's en-US grouping for any amount (independent implementation)", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e7, max: 1e7, noNaN: true }), fc.integer({ min: 0, max: 2 }), (value, decimals) => {
        const rounded = Number(value.toFixed(decimals));
        expect(formatNumber(value, decimals)).toBe(
          (Object.is(rounded, -0) ? 0 : rounded).toLocaleString("en-US", { maximumFractionDigits: decimals }),
        );
      }),
    );
  });

  it("writes dates month first, as US readers expect, whatever the host's locale", () => {
    expect(formatDate("2027-04-01")).toBe("April 1");
    expect(formatDate("2026-10-15")).toBe("October 15");
  });
});
