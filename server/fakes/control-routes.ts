import express from "express";
import { z } from "zod";
import type { OutboxResponse } from "#shared/schemas/outbox";
import { buildOutbox } from "./outbox.ts";
import type { RecordedSms } from "./sms-log.ts";
import type { FakeSmtpServer } from "./smtp.ts";

/**
 * Routes that span the fakes, mounted on the SMS gateway's server (its URL is FAKES_CONTROL_URL):
 *   GET    /__outbox          every SMS and e-mail our app sent, newest first (OutboxResponse)
 *   DELETE /__outbox          forget them all
 *   GET    /__email/messages  e-mails as received, with all headers
 *   DELETE /__email/messages  forget the e-mails
 *   GET    /__email/control   {down}
 *   POST   /__email/control   {down: boolean} makes the SMTP server answer 421 (temporary failure)
 */
export function createControlRouter(fakes: {
  listSms: () => RecordedSms[];
  clearSms: () => void;
  smtp: FakeSmtpServer;
}): express.Router {
  const { smtp } = fakes;
  const router = express.Router();

  router.get("/__outbox", (_req, res) => {
    const body: OutboxResponse = { messages: buildOutbox(fakes.listSms(), smtp.messages()) };
    res.json(body);
  });
  router.delete("/__outbox", (_req, res) => {
    fakes.clearSms();
    smtp.clear();
    res.status(204).end();
  });
  router.get("/__email/messages", (req, res) => {
    const to = typeof req.query.to === "string" ? req.query.to.toLowerCase() : null;
    const messages = smtp.messages().filter((m) => !to || m.envelopeTo.some((a) => a.toLowerCase() === to));
    res.json({ messages });
  });
  router.delete("/__email/messages", (_req, res) => {
    smtp.clear();
    res.status(204).end();
  });
  router.get("/__email/control", (_req, res) => {
    res.json({ down: smtp.isDown() });
  });
  router.post("/__email/control", (req, res) => {
    const parsed = z.object({ down: z.boolean() }).strict().safeParse(req.body ?? {});
    if (!parsed.success) return void res.status(400).json({ error: z.prettifyError(parsed.error) });
    smtp.setDown(parsed.data.down);
    res.json({ down: smtp.isDown() });
  });
  return router;
}
