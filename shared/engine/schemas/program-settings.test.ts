import { describe, expect, it } from "vitest";
import { defaultProgramSettings, programSettingBounds, programSettingsSchema } from "./program-settings.ts";

describe("program settings", () => {
  it("every default sits inside its own safe bounds and every bound names a source", () => {
    for (const [key, b] of Object.entries(programSettingBounds)) {
      expect(b.min, key).toBeLessThanOrEqual(b.default);
      expect(b.default, key).toBeLessThanOrEqual(b.max);
      expect(b.source.length, key).toBeGreaterThan(0);
      expect(defaultProgramSettings[key as keyof typeof programSettingBounds]).toBe(b.default);
    }
  });

  it("germination watering cannot be set below 2 weeks (Nebraska Extension column 2021; 2-week minimum common practice)", () => {
    expect(programSettingBounds.germinationDays.min).toBe(14);
    expect(programSettingsSchema.safeParse({ germinationDays: 13 }).success).toBe(false);
  });

  it("the first mow cannot be set before day 14 (first mowing not before about 2 weeks, common practice)", () => {
    expect(programSettingsSchema.safeParse({ firstMowMinDays: 13 }).success).toBe(false);
    expect(programSettingsSchema.safeParse({ firstMowMinDays: 21 }).success).toBe(true);
  });

  it("deep waterings stay at 2–3 a week during establishment (Nebraska Extension column 2021)", () => {
    expect(programSettingsSchema.safeParse({ establishmentWateringsPerWeek: 4 }).success).toBe(false);
  });

  it("a company's partial override keeps the other defaults and its version", () => {
    const parsed = programSettingsSchema.parse({ version: 3, trafficHoldDays: 35 });
    expect(parsed.version).toBe(3);
    expect(parsed.trafficHoldDays).toBe(35);
    expect(parsed.firstMowMinDays).toBe(defaultProgramSettings.firstMowMinDays);
  });
});
