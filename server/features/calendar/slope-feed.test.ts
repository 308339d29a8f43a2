import { describe, expect, it } from "vitest";
import ICAL from "ical.js";
import { buildFeed } from "./build-feed.ts";

/* A sloped lawn's watering is split into short runs (shared/engine/rules/slopes.ts): one calendar event per watering, not per run. */

function eventsOf(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  for (const zone of calendar.getAllSubcomponents("vtimezone")) ICAL.TimezoneService.register(zone);
  return calendar.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v));
}

const plan = { planId: 41, timeZone: "America/New_York", street: "9 Hill Road", holdOffs: [] };
const why = { text: "Short runs let each one soak in.", source: "test fixture", provenance: "common practice" };

describe("calendar feed on a slope", () => {
  it("one event per watering, spanning its runs, with the runs in its description", () => {
    const text = buildFeed({
      companyName: "Cobblefield Turf",
      plans: [plan],
      steps: [
        {
          planId: 41,
          key: "water:2026-10-05:0",
          date: "2026-10-05",
          kind: "water",
          title: "Water the seeded areas lightly 2 times today",
          state: "pending",
          content: {
            detail: "Keep the seed damp.",
            why,
            // Two waterings of four 2-minute runs, 30-minute pauses.
            times: ["07:00", "07:32", "08:04", "08:36", "12:00", "12:32", "13:04", "13:36"],
            minutesPerCycle: 2,
            cycleAndSoak: { runsPerCycle: 4, soakMinutes: 30, minutesBefore: 8, cycleStarts: ["07:00", "12:00"] },
          },
        },
      ],
    });
    const events = eventsOf(text);
    expect(events).toHaveLength(2);
    const [morning, noon] = events.sort((a, b) => a.startDate.compare(b.startDate));
    expect(morning!.uid).toBe("41.water:2026-10-05:0.0700@sproutline");
    expect(morning!.startDate.toString()).toBe("2026-10-05T07:00:00");
    // Ends when the last run (08:36, 2 minutes) does.
    expect(morning!.endDate.toString()).toBe("2026-10-05T08:38:00");
    expect(noon!.startDate.toString()).toBe("2026-10-05T12:00:00");
    expect(noon!.endDate.toString()).toBe("2026-10-05T13:38:00");
    expect(morning!.description).toContain(
      "In 4 short runs of 2 minutes for each zone or spot, with about 30 minutes' pause between runs so the water soaks in instead of running down the slope. Start each run at 7:00 am, 7:32 am, 8:04 am, 8:36 am.",
    );
    expect(morning!.description).toContain("Keep the seed damp.");
    expect(noon!.description).toContain("Start each run at 12:00 pm, 12:32 pm, 1:04 pm, 1:36 pm.");
  });

  it("a flat lawn's watering keeps one short event per time, with no runs line", () => {
    const text = buildFeed({
      companyName: "Cobblefield Turf",
      plans: [plan],
      steps: [{ planId: 41, key: "water:2026-10-05:0", date: "2026-10-05", kind: "water", title: "Water twice", state: "pending", content: { detail: "Keep it damp.", why, times: ["07:00", "12:00"], minutesPerCycle: 6 } }],
    });
    const events = eventsOf(text);
    expect(events.map((e) => `${e.startDate.toString()}–${e.endDate.toString()}`).sort()).toEqual(["2026-10-05T07:00:00–2026-10-05T07:06:00", "2026-10-05T12:00:00–2026-10-05T12:06:00"]);
    expect(events.every((e) => !e.description.includes("short runs"))).toBe(true);
  });
});
