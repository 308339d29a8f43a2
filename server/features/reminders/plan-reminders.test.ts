import { describe, expect, it } from "vitest";
import { deliveryChannels, fallbackChannel } from "./channels.ts";
import { desiredReminders, type PlanReminderInput } from "./plan-reminders.ts";
import { LEGAL_WINDOW } from "./quiet-hours.ts";

const base: PlanReminderInput = {
  active: true,
  timeZone: "America/New_York",
  window: LEGAL_WINDOW,
  channels: ["sms"],
  dailyTime: "08:00",
  wateringNudges: true,
  steps: [
    { date: "2026-12-02", kind: "water", state: "pending", times: ["07:00", "12:00", "16:00"] },
    { date: "2026-12-02", kind: "mow", state: "pending" },
    { date: "2026-12-03", kind: "water", state: "done", times: ["07:00", "12:00"] },
    { date: "2026-12-03", kind: "mow", state: "pending" },
  ],
};
const now = new Date("2026-12-01T20:00:00Z"); // 15:00 in New York
const summary = (r: { kind: string; localDate: string; dueAt: Date }) => `${r.kind} ${r.localDate} ${r.dueAt.toISOString()}`;

describe("which reminders a plan should have", () => {
  it("one daily summary per plan day, nudges for pending watering, none for done watering", () => {
    const out = desiredReminders(base, now).map(summary);
    expect(out).toEqual([
      "daily_summary 2026-12-02 2026-12-02T13:00:00.000Z",
      // 07:00 would be held to 08:00, the summary's own minute: the summary covers it.
      "watering_nudge 2026-12-02 2026-12-02T17:00:00.000Z",
      "watering_nudge 2026-12-02 2026-12-02T21:00:00.000Z",
      "daily_summary 2026-12-03 2026-12-03T13:00:00.000Z",
    ]);
  });

  it("holds a 07:00 nudge to 08:00 when the summary is later, and keeps it", () => {
    const out = desiredReminders({ ...base, dailyTime: "18:00" }, now).filter((r) => r.kind === "watering_nudge" && r.localDate === "2026-12-02");
    expect(out[0]).toMatchObject({ localTime: "07:00", dueAt: new Date("2026-12-02T13:00:00Z") });
  });

  it("nothing at all for a cancelled plan, for 'none', or when every channel is gone", () => {
    expect(desiredReminders({ ...base, active: false }, now)).toEqual([]);
    expect(desiredReminders({ ...base, channels: [] }, now)).toEqual([]);
  });

  it("sends today's summary late rather than never, but drops a stale nudge and anything that can't go today", () => {
    const today = { ...base, steps: [{ date: "2026-12-01", kind: "water" as const, state: "pending" as const, times: ["08:00", "12:00", "16:00"] }] };
    const out = desiredReminders(today, now).map((r) => `${r.kind} ${r.localTime}`);
    expect(out).toEqual(["daily_summary 08:00", "watering_nudge 16:00"]);
    // 22:00 in New York: nothing more can go today.
    expect(desiredReminders(today, new Date("2026-12-02T03:00:00Z"))).toEqual([]);
  });
});

describe("channels", () => {
  const both = { email: "r@example.com", phone: "+13305550111" };
  it("follows the choice, drops opted-out or missing channels, and falls back to the other when allowed", () => {
    expect(deliveryChannels("both", both, new Set())).toEqual(["sms", "email"]);
    expect(deliveryChannels("sms", both, new Set(["sms"]))).toEqual(["email"]);
    expect(deliveryChannels("sms", both, new Set(["sms", "email"]))).toEqual([]);
    expect(deliveryChannels("sms", { email: null, phone: null }, new Set())).toEqual([]);
    expect(deliveryChannels("none", both, new Set())).toEqual([]);
    expect(fallbackChannel("sms", "sms", both, new Set())).toBe("email");
    expect(fallbackChannel("sms", "sms", both, new Set(["email"]))).toBeNull();
    expect(fallbackChannel("sms", "none", both, new Set())).toBeNull();
  });
});

describe("watering nudges on a slope", () => {
  it("one nudge per watering, at its first run, not one per short run", () => {
    const slope: PlanReminderInput = {
      ...base,
      dailyTime: "06:00",
      window: { start: "06:00", end: "21:00" },
      steps: [
        {
          date: "2026-12-02",
          kind: "water",
          state: "pending",
          // Two waterings of three runs each (rules/slopes.ts: run + 30-minute pause).
          times: ["07:00", "07:34", "08:08", "12:00", "12:34", "13:08"],
          cycleAndSoak: { runsPerCycle: 3, cycleStarts: ["07:00", "12:00"] },
        },
      ],
    };
    const nudges = desiredReminders(slope, now).filter((r) => r.kind === "watering_nudge");
    expect(nudges.map((r) => r.localTime)).toEqual(["07:00", "12:00"]);
  });

  it("a step stored before waterings were recorded still gets a nudge per time", () => {
    const old: PlanReminderInput = { ...base, steps: [{ date: "2026-12-02", kind: "water", state: "pending", times: ["12:00", "12:34"] }] };
    expect(desiredReminders(old, now).filter((r) => r.kind === "watering_nudge").map((r) => r.localTime)).toEqual(["12:00", "12:34"]);
  });
});
