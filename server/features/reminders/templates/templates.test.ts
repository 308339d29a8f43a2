import { describe, expect, it } from "vitest";
import { isGsm7, smsLength, toGsm7 } from "./gsm.ts";
import { dailySummarySms, MAX_SMS_SEGMENTS, wateringNudgeSms } from "./sms.ts";
import { dailySummaryEmail, wateringNudgeEmail } from "./email.ts";

const frame = { senderName: "Cobblefield Turf", language: "en" as const, planUrl: "https://app.sproutline.example/portal/plan/123", intro: false };
const step = (title: string, extra: Record<string, unknown> = {}) => ({ kind: "water", title, ...extra });

describe("SMS length (GSM 03.38: 160 / 153 per segment, UCS-2: 70 / 67)", () => {
  it("counts GSM-7, extension characters and UCS-2", () => {
    expect(smsLength("a".repeat(160))).toEqual({ encoding: "GSM-7", units: 160, segments: 1 });
    expect(smsLength("a".repeat(161)).segments).toBe(2);
    expect(smsLength("€".repeat(80))).toEqual({ encoding: "GSM-7", units: 160, segments: 1 });
    expect(smsLength("a’b").encoding).toBe("UCS-2");
    expect(smsLength("é".repeat(71)).segments).toBe(1); // é is in the GSM basic set
    expect(smsLength("á".repeat(71)).segments).toBe(2); // á is not
  });

  it("rewrites typography into GSM-7 so one curly quote can't triple the cost", () => {
    expect(toGsm7("Don’t mow – wait ½ day… “ok”")).toBe(`Don't mow - wait 1/2 day... "ok"`);
    expect(toGsm7("Césped, regar días")).toBe("Césped, regar dias");
    expect(isGsm7(toGsm7("🌱 Seed’s up ✓"))).toBe(true);
  });
});

describe("reminder texts", () => {
  it("name the company, link the plan, and stay within two segments however long the day", () => {
    const long = Array.from({ length: 12 }, (_, i) => step(`Water the seeded areas lightly, cycle ${i + 1} – keep the top ½ inch damp`));
    for (const intro of [false, true]) {
      const text = dailySummarySms({ ...frame, intro }, "2026-12-01", long);
      expect(text.startsWith("Cobblefield Turf: ")).toBe(true);
      expect(text).toContain(frame.planUrl);
      expect(text).toMatch(/\+\d+ more/);
      expect(smsLength(text).encoding).toBe("GSM-7");
      expect(smsLength(text).segments).toBeLessThanOrEqual(MAX_SMS_SEGMENTS);
      expect(text.includes("Reply STOP to stop, HELP for help.")).toBe(intro);
    }
  });

  it("list a short day in full", () => {
    const text = dailySummarySms(frame, "2026-12-01", [step("Water 3 times"), { kind: "mow", title: "Mow to 3.5 in" }]);
    expect(text).toBe("Cobblefield Turf: Your lawn today, Tue, Dec 1: Water 3 times; Mow to 3.5 in. Plan: https://app.sproutline.example/portal/plan/123");
    expect(smsLength(text).segments).toBe(1);
  });

  it("keep Spanish texts in GSM-7 too", () => {
    const text = dailySummarySms({ ...frame, language: "es", intro: true }, "2026-12-01", [step("Riego ligero")]);
    expect(isGsm7(text)).toBe(true);
    expect(text).toContain("Responda STOP");
  });

  it("nudge with the watering time and minutes, inviting DONE", () => {
    const text = wateringNudgeSms({ ...frame, senderName: "A".repeat(400) }, "07:00", step("Water", { minutesPerCycle: 6 }));
    expect(smsLength(text).segments).toBeLessThanOrEqual(MAX_SMS_SEGMENTS);
    const normal = wateringNudgeSms(frame, "16:30", step("Water", { minutesPerCycle: 6 }));
    expect(normal).toContain("Watering time (4:30 pm). Run each zone or spot about 6 min. Reply DONE");
  });
});

describe("reminder e-mails", () => {
  it("have text and HTML parts, the plan link, and an unsubscribe link; HTML is escaped", () => {
    const email = dailySummaryEmail(
      { companyName: "Cobblefield <Turf>", firstName: "Ruth", language: "en", planUrl: frame.planUrl, unsubscribeUrl: "https://x.example/u?c=1&t=abc" },
      "2026-12-01",
      [{ kind: "water", title: "Water 3 times", detail: "Keep the seed damp" }],
    );
    expect(email.subject).toBe("Your lawn today (Tue, Dec 1): 1 task");
    expect(email.text).toContain("- Water 3 times\n  Keep the seed damp");
    expect(email.text).toContain(frame.planUrl);
    expect(email.html).toContain(`href="${frame.planUrl}"`);
    expect(email.html).toContain("Cobblefield &lt;Turf&gt;");
    expect(email.html).toContain("https://x.example/u?c=1&amp;t=abc");
  });
});

describe("watering reminders on a slope", () => {
  // Four runs of 2 minutes with 30-minute pauses, as rules/slopes.ts splits a steep spray-head cycle.
  const slopeStep = step("Water the seeded areas lightly 2 times today", {
    minutesPerCycle: 2,
    times: ["07:00", "07:32", "08:04", "08:36", "12:00", "12:32", "13:04", "13:36"],
    cycleAndSoak: { runsPerCycle: 4, soakMinutes: 30, cycleStarts: ["07:00", "12:00"] },
  });

  it("one text names the watering's short runs and pauses, within two GSM-7 segments", () => {
    const text = wateringNudgeSms(frame, "12:00", slopeStep);
    expect(text).toBe(
      "Cobblefield Turf: Watering time (12:00 pm). Water in 4 short runs of about 2 min each zone or spot, with 30-min pauses so it soaks in: 12:00 pm, 12:32 pm, 1:04 pm, 1:36 pm. Reply DONE when today's watering is finished. Plan: https://app.sproutline.example/portal/plan/123",
    );
    for (const intro of [false, true]) {
      const withIntro = wateringNudgeSms({ ...frame, intro }, "07:00", slopeStep);
      expect(smsLength(withIntro).encoding).toBe("GSM-7");
      expect(smsLength(withIntro).segments).toBeLessThanOrEqual(MAX_SMS_SEGMENTS);
      expect(withIntro).toContain("Plan: https://app.sproutline.example/portal/plan/123");
    }
  });

  it("says the same in Spanish, in GSM-7 and within two segments even with the first-text intro", () => {
    const text = wateringNudgeSms({ ...frame, language: "es", intro: true }, "07:00", slopeStep);
    expect(text).toContain("Hora de regar (7:00). Riegue en 4 tandas cortas de unos 2 min por zona, con pausas de 30 min para que el agua penetre: 7:00, 7:32, 8:04, 8:36.");
    expect(isGsm7(text)).toBe(true);
    expect(smsLength(text).segments).toBeLessThanOrEqual(MAX_SMS_SEGMENTS);
    expect(text).toContain("Responda STOP");
  });

  it("a flat lawn's nudge reads as before", () => {
    expect(wateringNudgeSms(frame, "07:00", step("Water", { minutesPerCycle: 6, times: ["07:00"] }))).toContain("Run each zone or spot about 6 min.");
  });

  it("e-mail lists the runs and the pause in both languages", () => {
    const emailFrame = { companyName: "Cobblefield Turf", firstName: "Ruth", planUrl: frame.planUrl, unsubscribeUrl: "https://x.example/u" };
    const en = wateringNudgeEmail({ ...emailFrame, language: "en" }, "07:00", slopeStep);
    expect(en.subject).toBe("Watering time: 7:00 am");
    expect(en.text).toContain("Water in 4 short runs of about 2 minutes for each zone or spot, pausing about 30 minutes between runs");
    expect(en.text).toContain("Start each run at: 7:00 am, 7:32 am, 8:04 am, 8:36 am.");
    expect(en.text).not.toContain("12:00 pm");
    const es = wateringNudgeEmail({ ...emailFrame, language: "es" }, "12:00", slopeStep);
    expect(es.text).toContain("Riegue en 4 tandas cortas de unos 2 minutos por zona");
    expect(es.html).toContain("Empiece cada tanda a las: 12:00, 12:32, 13:04, 13:36.");
  });
});
