import { outboxResponseSchema } from "#shared/schemas/outbox";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createEmailSender } from "../adapters/email.ts";
import { createSmsSender } from "../adapters/sms.ts";
import { startFakes, type RunningFakes } from "./index.ts";

let fakes: RunningFakes;

beforeAll(async () => {
  fakes = await startFakes({ sms: { statusStepMs: 10 } });
});
afterAll(async () => {
  await fakes.stop();
});

describe("startFakes", () => {
  it("runs all fakes on free loopback ports and shows what the app sent in one outbox", async () => {
    expect(fakes.smsUrl).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
    expect(fakes.oauthUrl).not.toBe(fakes.smsUrl);
    expect(fakes.controlUrl).toBe(fakes.smsUrl);

    const sms = createSmsSender({ accountSid: "AC00000000000000000000000000000000", authToken: "local-fake-auth-token", from: "+15005550006", apiBaseUrl: fakes.smsUrl });
    const email = createEmailSender({ host: fakes.smtpHost, port: fakes.smtpPort, from: "Sproutline <plans@sproutline.example>" });
    await sms.send({ to: "+13305550123", body: "Your care plan: https://app.example/s/abc" });
    await new Promise((resolve) => setTimeout(resolve, 5));
    await email.send({ to: "jo@example.com", subject: "Sign in", text: "https://app.example/e/xyz", html: '<a href="https://app.example/e/xyz">Sign in</a>' });

    const outbox = await fakes.listOutbox();
    expect(outbox.map((m) => [m.channel, m.to, m.links])).toEqual([
      ["email", "jo@example.com", ["https://app.example/e/xyz"]],
      ["sms", "+13305550123", ["https://app.example/s/abc"]],
    ]);

    const overHttp = outboxResponseSchema.parse(await (await fetch(`${fakes.controlUrl}/__outbox`)).json());
    expect(overHttp.messages).toEqual(outbox);

    const emails = (await (await fetch(`${fakes.controlUrl}/__email/messages`)).json()) as { messages: Array<{ subject: string }> };
    expect(emails.messages.map((m) => m.subject)).toEqual(["Sign in"]);

    expect((await fetch(`${fakes.controlUrl}/__outbox`, { method: "DELETE" })).status).toBe(204);
    expect(await fakes.listOutbox()).toEqual([]);
  });

  it("lets tests take the SMTP server down over HTTP", async () => {
    const res = await fetch(`${fakes.controlUrl}/__email/control`, { method: "POST", headers: { "Content-Type": "application/json" }, body: JSON.stringify({ down: true }) });
    expect(await res.json()).toEqual({ down: true });
    expect(fakes.smtp.isDown()).toBe(true);
    fakes.smtp.setDown(false);
  });

  it("refuses to start in production", async () => {
    const previous = process.env.NODE_ENV;
    process.env.NODE_ENV = "production";
    try {
      await expect(startFakes()).rejects.toThrow(/never run in production/);
    } finally {
      process.env.NODE_ENV = previous;
    }
  });
});
