import net from "node:net";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import { startFakeSmtp, type FakeSmtpServer } from "../fakes/smtp.ts";
import { createEmailSender, EmailSendError, toEmailSendError } from "./email.ts";

let smtp: FakeSmtpServer;

beforeAll(async () => {
  smtp = await startFakeSmtp();
});
afterAll(async () => {
  await smtp.stop();
});
afterEach(() => {
  smtp.clear();
  smtp.setDown(false);
});

const sender = (port = smtp.port) => createEmailSender({ host: smtp.host, port, from: "Sproutline <plans@sproutline.example>", timeoutMs: 2_000 });

async function sendError(promise: Promise<unknown>): Promise<EmailSendError> {
  const error = await promise.then(
    () => undefined,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(EmailSendError);
  return error as EmailSendError;
}

describe("createEmailSender through nodemailer", () => {
  it("delivers subject, text, html and List-Unsubscribe to the fake SMTP server", async () => {
    const unsubscribe = "<https://app.sproutline.example/unsubscribe?t=abc>, <mailto:unsubscribe@sproutline.example>";
    const { messageId } = await sender().send({
      to: "jo.homeowner@example.com",
      subject: "Your care plan is ready",
      text: "Open your plan: https://app.sproutline.example/sign-in?token=abc",
      html: '<p><a href="https://app.sproutline.example/sign-in?token=abc&amp;from=email">Open your plan</a></p>',
      headers: { "List-Unsubscribe": unsubscribe, "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" },
    });
    expect(messageId).toMatch(/^<.+@.+>$/);
    const [email] = smtp.messages();
    expect(email).toMatchObject({
      envelopeTo: ["jo.homeowner@example.com"],
      envelopeFrom: "plans@sproutline.example",
      from: "Sproutline <plans@sproutline.example>",
      to: "jo.homeowner@example.com",
      subject: "Your care plan is ready",
      messageId,
      listUnsubscribe: unsubscribe,
    });
    expect(email?.text.trim()).toBe("Open your plan: https://app.sproutline.example/sign-in?token=abc");
    expect(email?.html).toContain("Open your plan</a>");
    expect(email?.headers["list-unsubscribe-post"]).toBe("List-Unsubscribe=One-Click");
  });

  it("treats the server's 421 while it is down as transient", async () => {
    smtp.setDown(true);
    const error = await sendError(sender().send({ to: "a@example.com", subject: "s", text: "t" }));
    expect(error).toMatchObject({ kind: "transient", status: 421 });
    expect(smtp.messages()).toHaveLength(0);
  });

  it("treats a refused connection as transient", async () => {
    const closedPort = await new Promise<number>((resolve) => {
      const server = net.createServer().listen(0, "127.0.0.1", () => {
        const { port } = server.address() as net.AddressInfo;
        server.close(() => resolve(port));
      });
    });
    const error = await sendError(sender(closedPort).send({ to: "a@example.com", subject: "s", text: "t" }));
    expect(error).toMatchObject({ kind: "transient", status: null, code: "ESOCKET" });
  });

  it("classifies SMTP replies: 4xx transient, 5xx permanent", () => {
    expect(toEmailSendError({ responseCode: 451, code: "EENVELOPE", message: "try later" }).kind).toBe("transient");
    expect(toEmailSendError({ responseCode: 550, code: "EENVELOPE", message: "no such user" }).kind).toBe("permanent");
    expect(toEmailSendError({ responseCode: 535, code: "EAUTH", message: "bad login" }).kind).toBe("permanent");
    expect(toEmailSendError({ code: "ETIMEDOUT", message: "timeout" }).kind).toBe("transient");
    expect(toEmailSendError(new Error("weird")).kind).toBe("permanent");
  });
});
