import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays } from "#shared/engine/dates";
import { noticeDueAt } from "../notices/queue.ts";
import { desiredReminders, type StepForReminders } from "./plan-reminders.ts";
import { effectiveWindow, isInsideWindow } from "./quiet-hours.ts";
import { localMomentAt } from "./schedule.ts";

/*
 * One schedule: whatever the zone, the day (daylight-saving changes included) and the company's
 * narrower window, nothing is ever due outside the hours the customer allows, neither a plan
 * reminder nor a notice.
 */

// Both hemispheres, half- and quarter-hour offsets, a zone that changes at midnight (Havana), and no DST at all.
const zones = [
  "America/New_York", "America/Los_Angeles", "America/Denver", "America/Phoenix", "America/St_Johns", "America/Havana",
  "America/Santiago", "Europe/Berlin", "Europe/London", "Australia/Sydney", "Australia/Lord_Howe", "Pacific/Auckland",
  "Pacific/Chatham", "Asia/Kathmandu", "Asia/Kolkata", "Etc/UTC",
];

// 2026–2027 daylight-saving changes (US, EU, southern hemisphere): instants are drawn near them as well as anywhere.
const changes = [
  "2026-03-08T07:00:00Z", "2026-11-01T06:00:00Z", "2026-03-29T01:00:00Z", "2026-10-25T01:00:00Z",
  "2026-04-05T16:00:00Z", "2026-10-04T16:00:00Z", "2027-03-14T07:00:00Z", "2027-11-07T06:00:00Z",
  "2027-03-28T01:00:00Z", "2027-10-31T01:00:00Z",
].map((s) => Date.parse(s));
const hour = 3_600_000;
const anyInstant = fc.integer({ min: Date.parse("2026-01-01T00:00:00Z"), max: Date.parse("2027-12-31T00:00:00Z") });
const nearChange = fc.tuple(fc.constantFrom(...changes), fc.integer({ min: -36 * hour, max: 36 * hour })).map(([c, d]) => c + d);
const instant = fc.oneof(anyInstant, nearChange).map((ms) => new Date(ms));

const hhmm = (h: number, m: number) => `${String(h).padStart(2, "0")}:${String(m).padStart(2, "0")}`;
const clock = fc.tuple(fc.integer({ min: 0, max: 23 }), fc.constantFrom(0, 15, 30, 45)).map(([h, m]) => hhmm(h, m));
// The company's own window (maybe none); effectiveWindow keeps it inside the legal 08:00–21:00.
const window = fc.option(fc.tuple(clock, clock), { nil: undefined }).map((w) => effectiveWindow(w ? { start: w[0], end: w[1] } : {}));

describe("nothing is scheduled outside the customer's allowed hours", () => {
  it("notices: due after the gathering delay, inside the window, whatever the zone and season", () => {
    fc.assert(
      fc.property(instant, fc.constantFrom(...zones), window, fc.integer({ min: 0, max: 3600 }), (now, zone, w, gather) => {
        const due = noticeDueAt(now, zone, w, gather);
        expect(isInsideWindow(due, zone, w)).toBe(true);
        expect(due.getTime()).toBeGreaterThanOrEqual(now.getTime() + gather * 1000);
        // Held no longer than needed: never more than a day and a half past the gathering delay.
        expect(due.getTime() - (now.getTime() + gather * 1000)).toBeLessThanOrEqual(36 * hour);
      }),
      { numRuns: 3000 },
    );
  });

  it("plan reminders: every daily summary and watering nudge is due inside the window, on its own plan day", () => {
    // Steps by day offset from the customer's today, which depends on the drawn instant and zone.
    const step = fc.record({
      offset: fc.integer({ min: -1, max: 4 }),
      kind: fc.constantFrom("water", "mow", "feed"),
      state: fc.constantFrom<StepForReminders["state"][]>("pending", "pending", "done", "skipped"),
      times: fc.array(clock, { maxLength: 4 }),
    });
    let scheduled = 0;
    fc.assert(
      fc.property(
        instant,
        fc.constantFrom(...zones),
        window,
        clock,
        fc.boolean(),
        fc.subarray(["sms", "email"] as const, { minLength: 1 }),
        fc.array(step, { maxLength: 8 }),
        (now, zone, w, dailyTime, wateringNudges, channels, drawn) => {
          const today = localMomentAt(now, zone).date;
          const steps = drawn.map((s): StepForReminders => ({ date: addDays(today, s.offset), kind: s.kind, state: s.state, times: s.kind === "water" ? s.times : undefined }));
          const out = desiredReminders({ active: true, timeZone: zone, window: w, channels, dailyTime, wateringNudges, steps }, now);
          for (const r of out) {
            expect(isInsideWindow(r.dueAt, zone, w), `${r.kind} ${r.localDate} ${r.localTime} due ${r.dueAt.toISOString()} in ${zone}`).toBe(true);
            expect(localMomentAt(r.dueAt, zone).date).toBe(r.localDate);
          }
          scheduled += out.length;
        },
      ),
      { numRuns: 1500 },
    );
    // The property is only worth something if plenty of reminders were actually checked.
    expect(scheduled).toBeGreaterThan(1500);
  });
});
