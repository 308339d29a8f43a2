import { describe, expect, it } from "vitest";
import { isGsm7, smsLength } from "./gsm.ts";
import { conversationUpdate, phoneLabel, visitUpdate, welcome, type NoticeFrame } from "./notices.ts";

const frame = (overrides: Partial<NoticeFrame> = {}): NoticeFrame => ({
  senderName: "Cobblefield",
  companyName: "Cobblefield Turf Care",
  companyPhone: "+15555550142",
  logoUrl: null,
  firstName: "Ruth",
  language: "en",
  link: "https://app.example/portal/messages?plan=12",
  unsubscribeUrl: "https://app.example/api/unsubscribe/email?c=1&t=x",
  intro: true,
  ...overrides,
});

const long = "Yes, that’s normal — shady spots near the fence come up a week or two later than the sunny ones. ".repeat(6);

describe("notice texts", () => {
  it.each(["en", "es"] as const)("an answer text in %s names the company, keeps the link and the stop words, and fits two GSM-7 segments", (language) => {
    const { body } = conversationUpdate(frame({ language }), "sms", [{ authorName: "Marco Ruiz", text: long }]);
    expect(body.startsWith("Cobblefield:")).toBe(true);
    expect(body).toContain("https://app.example/portal/messages?plan=12");
    expect(body).toContain("(555) 555-0142");
    expect(body).toContain("STOP");
    expect(isGsm7(body)).toBe(true);
    expect(smsLength(body).segments).toBeLessThanOrEqual(2);
    expect(body).toContain("...");
  });

  it("several answers make one text that counts them and quotes the latest", () => {
    const { body } = conversationUpdate(frame({ intro: false }), "sms", [
      { authorName: "Marco Ruiz", text: "Water twice a day." },
      { authorName: "Dana Lee", text: "And keep the dog off." },
    ]);
    expect(body).toBe('Cobblefield: 2 new replies to your question. Latest: "And keep the dog off." Read it: https://app.example/portal/messages?plan=12 Office: (555) 555-0142');
  });

  it("an answer e-mail quotes every unread answer, escapes them in HTML and shows the logo when there is one", () => {
    const mail = conversationUpdate(frame({ logoUrl: "https://app.example/api/companies/1/logo" }), "email", [
      { authorName: "Marco Ruiz", text: "Use <b>less</b> water" },
      { authorName: "Dana Lee", text: "See you Friday" },
    ]);
    expect(mail.subject).toBe("Cobblefield Turf Care answered your question");
    expect(mail.body).toContain("Marco Ruiz:\nUse <b>less</b> water");
    expect(mail.body).toContain("Dana Lee:\nSee you Friday");
    expect(mail.html).toContain("Use &lt;b&gt;less&lt;/b&gt; water");
    expect(mail.html).toContain('<img src="https://app.example/api/companies/1/logo"');
    expect(mail.html).toContain("Call or text the office at (555) 555-0142.");
  });

  it.each(["booked", "moved", "cancelled", "done"] as const)("a visit %s text says when, who and why within two segments", (change) => {
    const { body } = visitUpdate(frame({ intro: false }), "sms", {
      change,
      date: "2026-12-09",
      arrivalStart: "09:00",
      arrivalEnd: "11:00",
      technicianName: "Marco Ruiz",
      reason: "no_germination",
      customerPrep: "Please don't mow the day before and leave the side gate unlocked. ".repeat(4),
      workDone: "Reseeded the bare strip by the fence.",
    });
    expect(body).toContain("Wed, Dec 9 between 9:00 am and 11:00 am");
    expect(body).toContain("seed that has not come up");
    expect(smsLength(body).segments).toBeLessThanOrEqual(2);
    if (change === "booked" || change === "moved") expect(body).toContain("Marco Ruiz is coming");
    if (change === "done") expect(body).toContain("Reseeded the bare strip");
  });

  it("a welcome text lists the first steps and the one-tap link; the Spanish e-mail says the same in Spanish", () => {
    const steps = [
      { date: "2026-12-05", title: "Water the seeded areas lightly" },
      { date: "2026-12-06", title: "Keep off the new grass" },
    ];
    const sms = welcome(frame({ link: "https://app.example/portal/sign-in/verify?token=abc" }), "sms", steps, 7);
    expect(sms.body).toContain("Water the seeded areas lightly; Keep off the new grass.");
    expect(sms.body).toContain("https://app.example/portal/sign-in/verify?token=abc");
    expect(smsLength(sms.body).segments).toBeLessThanOrEqual(2);
    const es = welcome(frame({ language: "es" }), "email", steps, 7);
    expect(es.subject).toBe("Su plan de cuidado del césped de Cobblefield Turf Care");
    expect(es.body).toContain("sáb, 5 dic: Water the seeded areas lightly");
  });

  it("formats North American numbers for reading and leaves others as stored", () => {
    expect(phoneLabel("+15555550142")).toBe("(555) 555-0142");
    expect(phoneLabel("+447700900123")).toBe("+447700900123");
  });
});
