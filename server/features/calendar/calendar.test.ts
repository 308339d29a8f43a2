import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import ICAL from "ical.js";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createPlanFixture } from "../questions/testing/plan-fixture.ts";

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let lucia: Agent;
let tomasz: Agent;
let planId: number;
let otherPlanId: number;

/** The path of a feed URL (the app is driven in-process, not at PUBLIC_URL). */
const pathOf = (url: string) => new URL(url).pathname;

async function feed(url: string) {
  const res = await request(ctx.app).get(pathOf(url)).buffer(true).parse((r, done) => {
    let text = "";
    r.setEncoding("utf8");
    r.on("data", (chunk: string) => (text += chunk));
    r.on("end", () => done(null, text));
  });
  return res;
}

function parseFeed(text: string) {
  const calendar = new ICAL.Component(ICAL.parse(text));
  for (const zone of calendar.getAllSubcomponents("vtimezone")) ICAL.TimezoneService.register(zone);
  const events = calendar.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v));
  return { calendar, events };
}

beforeAll(async () => {
  ctx = await createTestContext();
  ({ planId } = await createPlanFixture(ctx.db, {
    customerRef: "C-1005",
    steps: [
      { key: "water-2026-10-05", date: "2026-10-05", kind: "water", title: "Water twice, 6 minutes per zone", content: { times: ["06:00", "12:00"], minutesPerCycle: 6 } },
      // The day after clocks fall back in New York (1 November 2026).
      { key: "water-2026-11-02", date: "2026-11-02", kind: "water", title: "Water once", content: { times: ["06:00"], minutesPerCycle: 10 } },
      { key: "first-mow", date: "2026-10-20", kind: "mow", title: "First mowing at 3.5 in", phase: "establishment" },
      { key: "feed-1", date: "2026-10-25", kind: "feed", title: "Feed with starter fertiliser", state: "skipped" },
      { key: "check-in-1", date: "2026-10-10", kind: "check_in_photo", title: "Send a check-in photo", state: "done" },
    ],
    holdOffs: [
      { kind: "weed_and_feed", start: "2026-09-15", end: "2026-11-15" },
      { kind: "crabgrass_pre_emergent", start: "2026-09-15", end: "2026-12-01", source: "Label intervals recalled, not re-read", provenance: "from memory" },
    ],
  }));
  ({ planId: otherPlanId } = await createPlanFixture(ctx.db, {
    customerRef: "C-1002",
    steps: [{ key: "first-mow", date: "2026-10-21", kind: "mow", title: "Tomasz's mowing" }],
  }));
  lucia = await signInCustomer(ctx, "lucia.marchetti@mail.example");
  tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
});

afterAll(async () => ctx.close());

describe("calendar feed link", () => {
  it("is made on first request and shown again unchanged", async () => {
    const first = await lucia.get("/api/my/calendar").expect(200);
    expect(first.body.url).toMatch(/^http:\/\/localhost:5999\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    expect(first.headers["cache-control"]).toBe("no-store");
    const again = await lucia.get("/api/my/calendar").expect(200);
    expect(again.body.url).toBe(first.body.url);
  });

  it("stores only a hash and a sealed copy of the token", async () => {
    const { body } = await lucia.get("/api/my/calendar").expect(200);
    const token = pathOf(body.url).slice("/calendar/".length, -".ics".length);
    const rows = await ctx.db("calendar_feeds").select("token_hash", "token_sealed");
    for (const row of rows) expect(JSON.stringify(row)).not.toContain(token);
  });

  it("is for customers only", async () => {
    const marco = await signInStaff(ctx, "marco@cobblefield.example");
    await marco.get("/api/my/calendar").expect(403);
    await request(ctx.app).get("/api/my/calendar").expect(401);
  });
});

describe("the feed", () => {
  it("is an RFC 5545 calendar of the customer's steps and hold-offs", async () => {
    const { body } = await lucia.get("/api/my/calendar").expect(200);
    const res = await feed(body.url);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("text/calendar; charset=utf-8");
    const text = res.body as string;
    const { calendar, events } = parseFeed(text);
    expect(calendar.getFirstPropertyValue("x-wr-calname")).toContain("Cobblefield Turf Care");

    const ours = events.filter((e) => e.uid.startsWith(`${planId}.`));
    // 2 + 1 watering starts, first mowing, check-in (done still shows), two hold-offs; the skipped feed is left out.
    expect(ours).toHaveLength(7);
    expect(ours.some((e) => e.summary.includes("starter"))).toBe(false);
    expect(events.some((e) => e.uid.startsWith(`${otherPlanId}.`))).toBe(false);

    const watering = ours.filter((e) => !e.startDate.isDate);
    expect(watering).toHaveLength(3);
    for (const e of watering) expect(e.component.getFirstProperty("dtstart")!.getParameter("tzid")).toBe("America/New_York");
    const starts = watering.map((e) => e.startDate.toJSDate().toISOString()).sort();
    // 06:00 and 12:00 EDT (UTC−4) on 5 October; 06:00 EST (UTC−5) on 2 November.
    expect(starts).toEqual(["2026-10-05T10:00:00.000Z", "2026-10-05T16:00:00.000Z", "2026-11-02T11:00:00.000Z"]);
    const sixAm = watering.find((e) => e.startDate.toString() === "2026-10-05T06:00:00")!;
    expect(sixAm.endDate.toString()).toBe("2026-10-05T06:06:00");
    expect(text).toMatch(/DTSTART;TZID=America\/New_York:20261005T060000/);

    const mow = ours.find((e) => e.summary === "First mowing at 3.5 in")!;
    expect(mow.startDate.isDate).toBe(true);
    expect(mow.startDate.toString()).toBe("2026-10-20");
    expect(mow.endDate.toString()).toBe("2026-10-21");

    const holdOff = ours.find((e) => e.uid.includes("hold-off.weed_and_feed"))!;
    expect(holdOff.summary).toBe("No weed-and-feed");
    expect(holdOff.startDate.toString()).toBe("2026-09-15");
    // DTEND of an all-day event is exclusive: the last held-off day is 15 November.
    expect(holdOff.endDate.toString()).toBe("2026-11-16");
    expect(holdOff.description).toContain("Source: test fixture.");

    // A value still recalled from memory is never cited to the homeowner.
    const recalled = ours.find((e) => e.uid.includes("hold-off.crabgrass_pre_emergent"))!;
    expect(recalled.description).toContain("Based on common lawn-care practice.");
    expect(recalled.description).not.toContain("recalled");
    expect(recalled.description).not.toContain("Source:");
  });

  it("unknown and malformed tokens → 404", async () => {
    await request(ctx.app).get(`/calendar/${"A".repeat(43)}.ics`).expect(404);
    await request(ctx.app).get("/calendar/short.ics").expect(404);
    await request(ctx.app).get("/calendar/../api/me.ics").expect(404);
    for (const path of ["/calendar/.ics", "/calendar/", "/calendar", "/calendar/x.txt"]) {
      const res = await request(ctx.app).get(path).expect(404);
      expect(res.body.error.code, path).toBe("not_found");
    }
    const { body } = await lucia.get("/api/my/calendar").expect(200);
    await request(ctx.app).get(pathOf(body.url).replace(/\.ics$/, "")).expect(404);
  });

  it("rotating makes a new link and the old one stops working", async () => {
    const old = (await lucia.get("/api/my/calendar").expect(200)).body.url as string;
    const rotated = await lucia.post("/api/my/calendar/rotate").expect(200);
    expect(rotated.body.url).not.toBe(old);
    expect((await feed(old)).status).toBe(404);
    expect((await feed(rotated.body.url)).status).toBe(200);
    expect((await lucia.get("/api/my/calendar").expect(200)).body.url).toBe(rotated.body.url);
  });

  it("each customer's link shows only their own plans", async () => {
    const { body } = await tomasz.get("/api/my/calendar").expect(200);
    const { events } = parseFeed((await feed(body.url)).body as string);
    expect(events.some((e) => e.uid.startsWith(`${planId}.`))).toBe(false);
    expect(events.some((e) => e.uid.startsWith(`${otherPlanId}.`))).toBe(true);
  });

  it("concurrent first requests end with one live link", async () => {
    const imogen = await signInCustomer(ctx, "imogen.c@mail.example");
    const urls = await Promise.all([1, 2, 3, 4].map(() => imogen.get("/api/my/calendar").expect(200)));
    expect(new Set(urls.map((r) => r.body.url)).size).toBe(1);
    expect((await feed(urls[0]!.body.url)).status).toBe(200);
  });
});
