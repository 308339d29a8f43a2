import { describe, expect, it } from "vitest";
import { stripReply } from "./strip-reply.ts";

// Samples laid out the way each mail client quotes (written for these tests, not copied mail).
describe("stripReply", () => {
  it("Gmail: keeps the reply above a wrapped 'On … wrote:' line and drops the quote", () => {
    const text = [
      "A few spots by the driveway still look bare. Should I reseed them?",
      "",
      "Thanks,",
      "Dana",
      "",
      "On Tue, Dec 1, 2026 at 9:14 AM Greenway Lawn Care <",
      "reply+Q2x8fK3mPz0aLw9Rt5uVbA@replies.sproutline.example> wrote:",
      "",
      "> Water 3 times today, 6 minutes per zone.",
      "> Reply to this e-mail if you have a question.",
      "",
    ].join("\n");
    expect(stripReply(text)).toBe("A few spots by the driveway still look bare. Should I reseed them?\n\nThanks,\nDana");
  });

  it("Apple Mail: drops 'Sent from my iPhone' and the quote under 'On … at …, … wrote:'", () => {
    const text = [
      "Is it ok to mow this weekend? The grass is about 4 inches.",
      "",
      "Sent from my iPhone",
      "",
      "> On Dec 1, 2026, at 9:14 AM, Greenway Lawn Care <reply+abcDEF0123456789xyz@replies.sproutline.example> wrote:",
      ">",
      "> Don't mow until the new grass is 3.5 inches tall.",
    ].join("\r\n");
    expect(stripReply(text)).toBe("Is it ok to mow this weekend? The grass is about 4 inches.");
  });

  it("Outlook: cuts at the rule and 'From: … Sent: …' header block", () => {
    const text = [
      "Photo attached. The yellow patch is bigger than last week.",
      "",
      "Get Outlook for Android",
      "________________________________",
      "From: Greenway Lawn Care <plans@greenway.example>",
      "Sent: Tuesday, December 1, 2026 9:14 AM",
      "To: Dana Reyes <dana@example.com>",
      "Subject: Your lawn today",
      "",
      "Water 3 times today, 6 minutes per zone.",
    ].join("\n");
    expect(stripReply(text)).toBe("Photo attached. The yellow patch is bigger than last week.");
  });

  it("Outlook desktop: '-----Original Message-----' and a '-- ' signature", () => {
    const text = [
      "Can you come Thursday instead?",
      "",
      "-- ",
      "Pat Nguyen",
      "555-0142",
      "",
      "-----Original Message-----",
      "From: Greenway Lawn Care",
      "Sent: Monday, November 30, 2026 4:02 PM",
      "Your follow-up visit is booked for Wednesday.",
    ].join("\n");
    expect(stripReply(text)).toBe("Can you come Thursday instead?");
  });

  it("Spanish Gmail: 'El … escribió:' and 'Enviado desde mi teléfono'", () => {
    const text = [
      "Hay partes sin césped todavía. ¿Tengo que volver a sembrar?",
      "",
      "Enviado desde mi teléfono",
      "",
      "El mar, 1 dic 2026 a las 9:14, Greenway Lawn Care (<reply+Zx9Yw8Vu7Ts6Rq5P@replies.sproutline.example>)",
      "escribió:",
      "",
      "> Riegue 3 veces hoy.",
    ].join("\n");
    expect(stripReply(text)).toBe("Hay partes sin césped todavía. ¿Tengo que volver a sembrar?");
  });

  it("Spanish Outlook: 'De: … Enviado: … Para: … Asunto:' block", () => {
    const text = [
      "Gracias, ya regué esta mañana.",
      "",
      "De: Greenway Lawn Care <plans@greenway.example>",
      "Enviado: martes, 1 de diciembre de 2026 9:14",
      "Para: Lucía Gómez <lucia@example.com>",
      "Asunto: Su césped hoy",
      "",
      "Riegue 3 veces hoy.",
    ].join("\n");
    expect(stripReply(text)).toBe("Gracias, ya regué esta mañana.");
  });

  it("keeps the homeowner's own lines between inline quotes", () => {
    const text = [
      "> Water 3 times today?",
      "Yes, I did that.",
      "> And no weed killer until March.",
      "What about the crabgrass preventer?",
    ].join("\n");
    expect(stripReply(text)).toBe("Yes, I did that.\nWhat about the crabgrass preventer?");
  });

  it("leaves a reply without quote or signature as it is (trimmed)", () => {
    expect(stripReply("  The sprinkler on the left side doesn't reach the corner.\n\n")).toBe(
      "The sprinkler on the left side doesn't reach the corner.",
    );
  });

  it("does not mistake a sentence starting with 'On' for a quote header", () => {
    const text = "On Saturday the dog dug up a patch.\nShould I reseed it?";
    expect(stripReply(text)).toBe(text);
  });
});
