import { describe, expect, it } from "vitest";
import { parseInbound } from "./parse.ts";

describe("reading an inbound e-mail", () => {
  it("drops NUL characters from the text, subject and ids, which PostgreSQL cannot store", async () => {
    const raw = Buffer.from(
      [
        "From: Ruth Okonkwo <ruth.okonkwo@mail.example>",
        "To: reply+abc@replies.sproutline.example",
        "Subject: Brown\u0000 spots",
        "Message-ID: <nul\u0000test@mail.example>",
        "Content-Type: text/plain; charset=utf-8",
        "",
        "The patch by the\u0000 fence is brown.",
        "",
      ].join("\r\n"),
      "utf8",
    );
    const mail = await parseInbound(raw);
    expect(mail.text).toContain("The patch by the fence is brown.");
    expect(mail.subject).toBe("Brown spots");
    expect(mail.messageId).toBe("<nultest@mail.example>");
    expect(mail.from).toBe("ruth.okonkwo@mail.example");
    expect(JSON.stringify(mail)).not.toContain("\\u0000");
  });
});
