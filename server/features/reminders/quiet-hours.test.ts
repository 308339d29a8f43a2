import { describe, expect, it } from "vitest";
import { effectiveWindow, isInsideWindow, LEGAL_WINDOW, nextAllowedInstant } from "./quiet-hours.ts";

const at = (s: string) => new Date(s);
const iso = (d: Date) => d.toISOString().replace(".000", "");

describe("quiet hours: 08:00–21:00 at the recipient's location (47 CFR § 64.1200(c)(1), from memory)", () => {
  it("lets through 08:00 to 21:00 local, inclusive, and nothing else", () => {
    const ny = "America/New_York";
    expect(isInsideWindow(at("2026-12-01T12:59:00Z"), ny, LEGAL_WINDOW)).toBe(false); // 07:59
    expect(isInsideWindow(at("2026-12-01T13:00:00Z"), ny, LEGAL_WINDOW)).toBe(true); // 08:00
    expect(isInsideWindow(at("2026-12-02T02:00:40Z"), ny, LEGAL_WINDOW)).toBe(true); // 21:00:40
    expect(isInsideWindow(at("2026-12-02T02:01:00Z"), ny, LEGAL_WINDOW)).toBe(false); // 21:01
  });

  it("holds an early reminder until 08:00 the same day and a late one until 08:00 the next day", () => {
    expect(iso(nextAllowedInstant(at("2026-12-01T12:00:00Z"), "America/New_York", LEGAL_WINDOW))).toBe("2026-12-01T13:00:00Z");
    expect(iso(nextAllowedInstant(at("2026-12-02T03:00:00Z"), "America/New_York", LEGAL_WINDOW))).toBe("2026-12-02T13:00:00Z");
    expect(iso(nextAllowedInstant(at("2026-12-01T15:00:00Z"), "America/New_York", LEGAL_WINDOW))).toBe("2026-12-01T15:00:00Z");
  });

  it("judges by the recipient's zone, not the server's", () => {
    // 14:00 UTC is 09:00 in New York but 06:00 in Los Angeles.
    const instant = at("2026-12-01T14:00:00Z");
    expect(isInsideWindow(instant, "America/New_York", LEGAL_WINDOW)).toBe(true);
    expect(iso(nextAllowedInstant(instant, "America/Los_Angeles", LEGAL_WINDOW))).toBe("2026-12-01T16:00:00Z");
  });

  it("opens at 08:00 local across both daylight-saving changes", () => {
    // Held from the night before each change, the reminder goes at 08:00 local under the new offset.
    expect(iso(nextAllowedInstant(at("2026-03-08T03:00:00Z"), "America/New_York", LEGAL_WINDOW))).toBe("2026-03-08T12:00:00Z");
    expect(iso(nextAllowedInstant(at("2026-11-01T03:00:00Z"), "America/New_York", LEGAL_WINDOW))).toBe("2026-11-01T13:00:00Z");
  });

  it("lets a company narrow the window but never widen it", () => {
    expect(effectiveWindow({ start: "09:30", end: "18:00" })).toEqual({ start: "09:30", end: "18:00" });
    expect(effectiveWindow({ start: "06:00", end: "23:00" })).toEqual(LEGAL_WINDOW);
    expect(effectiveWindow({ start: "19:00", end: "10:00" })).toEqual(LEGAL_WINDOW);
    const narrow = effectiveWindow({ start: "09:30", end: "18:00" });
    expect(iso(nextAllowedInstant(at("2026-12-01T13:00:00Z"), "America/New_York", narrow))).toBe("2026-12-01T14:30:00Z");
  });
});
