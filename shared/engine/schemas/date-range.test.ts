import { describe, expect, it } from "vitest";
import { applicationRecordSchema } from "../../schemas/visits.ts";
import { DATE_RANGE_MESSAGE, isoDateSchema } from "./common.ts";

describe("the product's date range", () => {
  it("takes 1900-01-01 through 2199-12-31", () => {
    for (const date of ["1900-01-01", "2026-09-10", "2199-12-31"]) expect(isoDateSchema.safeParse(date).success).toBe(true);
  });

  it("refuses year 0000, the day before and after, and year 9999 with the range message", () => {
    for (const date of ["0000-01-01", "1899-12-31", "2200-01-01", "9999-12-31"]) {
      const result = isoDateSchema.safeParse(date);
      expect(result.success).toBe(false);
      expect(result.error?.issues.map((i) => i.message)).toEqual([DATE_RANGE_MESSAGE]);
    }
  });

  it("keeps the calendar message for impossible dates", () => {
    expect(isoDateSchema.safeParse("2026-02-30").error?.issues[0]?.message).toBe("Use a real calendar date written YYYY-MM-DD");
  });

  it("applies to an application record's time too", () => {
    const record = {
      product: "Invented Weed Stop",
      epaRegistrationNumber: "0000-00",
      rate: { amount: 1.5, unit: "oz per 1,000 ft²" },
      areaTreated: 5000,
      targetPest: "dandelion",
      applicatorName: "Marco Ibsen",
      applicatorLicenceNumber: "OH-123",
    };
    expect(applicationRecordSchema.safeParse({ ...record, appliedAt: "2026-09-10T14:30:00-04:00" }).success).toBe(true);
    const bad = applicationRecordSchema.safeParse({ ...record, appliedAt: "0000-09-10T14:30:00Z" });
    expect(bad.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([["appliedAt", DATE_RANGE_MESSAGE]]);
  });
});
