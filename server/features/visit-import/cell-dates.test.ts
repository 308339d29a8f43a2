import { describe, expect, it } from "vitest";
import { DATE_RANGE_MESSAGE } from "#shared/engine/schemas/common";
import { readCellDate } from "./cell-dates.ts";

describe("import dates", () => {
  it("reads US dates month first, with or without leading zeros, and ISO dates", () => {
    expect(readCellDate("09/08/2026")).toEqual({ date: "2026-09-08" });
    expect(readCellDate("9/8/2026")).toEqual({ date: "2026-09-08" });
    expect(readCellDate("12/31/2026")).toEqual({ date: "2026-12-31" });
    expect(readCellDate(" 2026-09-08 ")).toEqual({ date: "2026-09-08" });
    expect(readCellDate("2/29/2028")).toEqual({ date: "2028-02-29" });
  });

  it("reads a date-time cell at midnight, as spreadsheets save date-time columns", () => {
    expect(readCellDate("9/8/2026 0:00")).toEqual({ date: "2026-09-08" });
    expect(readCellDate("09/08/2026 00:00:00")).toEqual({ date: "2026-09-08" });
    expect(readCellDate("9/8/2026 14:30")).toMatchObject({ error: expect.stringMatching(/not a date/) });
  });

  it("explains a day-first date instead of swapping it", () => {
    expect(readCellDate("25/09/2026")).toEqual({ error: expect.stringMatching(/no month 25.*month first.*09\/25\/2026/) });
  });

  it("refuses two-digit years, impossible days and other shapes, saying why", () => {
    expect(readCellDate("9/8/26")).toEqual({ error: "Write the year in full: 9/8/2026" });
    expect(readCellDate("9/8/126")).toEqual({ error: '"9/8/126" is not a date: write the year with four digits' });
    expect(readCellDate("2/29/2027")).toEqual({ error: '"2/29/2027" is not a date: February 2027 has no day 29' });
    expect(readCellDate("2026-13-40")).toEqual({ error: '"2026-13-40" is not a date: there is no month 13' });
    expect(readCellDate("Sept 8, 2026")).toMatchObject({ error: expect.stringMatching(/MM\/DD\/YYYY.*YYYY-MM-DD/) });
    expect(readCellDate("2026-9-8")).toMatchObject({ error: expect.stringMatching(/not a date/) });
  });

  it("keeps to the product's date range", () => {
    expect(readCellDate("01/01/0000")).toEqual({ error: DATE_RANGE_MESSAGE });
    expect(readCellDate("0000-01-01")).toEqual({ error: DATE_RANGE_MESSAGE });
    expect(readCellDate("12/31/9999")).toEqual({ error: DATE_RANGE_MESSAGE });
  });
});
