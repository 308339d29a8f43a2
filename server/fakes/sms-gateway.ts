import express, { type NextFunction, type Request, type Response } from "express";
import multer from "multer";
import { z } from "zod";
import { parseBasicAuth } from "./basic-auth.ts";
import { listenHttp } from "./http-listen.ts";
import { DeliverySimulator } from "./sms-delivery.ts";
import { SmsFaultPolicy, isInvalidNumber, smsFaultSettingsSchema, type SmsFaultSettings } from "./sms-faults.ts";
import { deliverInbound, optOutChange, type InboundResult } from "./sms-inbound.ts";
import { renderInboundForm, renderInboundResult } from "./sms-inbound-page.ts";
import { listMessages } from "./sms-list.ts";
import { MediaStore, samplePhoto, type FakeMedia } from "./sms-media.ts";
import { SmsLog, type RecordedSms } from "./sms-log.ts";
import { messageResource, newSid, TWILIO_API_VERSION, twilioError, type TwilioErrorBody } from "./twilio-format.ts";

export interface SmsGatewayOptions {
  port?: number;
  host?: string;
  accountSid: string;
  authToken: string;
  /** Our number: the To of simulated inbound texts and the From of messaging-service sends. */
  phoneNumber?: string;
  /** Where simulated inbound texts are POSTed (the app's inbound SMS webhook). */
  inboundWebhookUrl?: string | null;
  faults?: Partial<SmsFaultSettings>;
  /** Time between status steps (queued → sent → delivered). */
  statusStepMs?: number;
  /** Injected so tests can make random failures deterministic. */
  random?: () => number;
  /**
   * Adds more routes to this server. The gateway's URL doubles as the fakes' control URL
   * (FAKES_CONTROL_URL), so the combined outbox and the e-mail controls live here too.
   */
  mount?: (app: express.Express) => void;
}

export interface FakeSmsGateway {
  url: string;
  port: number;
  messages(): RecordedSms[];
  /** API requests received and still waiting out the configured latency: accepted, not yet answered. */
  requestsInLatency(): number;
  clear(): void;
  faults(): SmsFaultSettings;
  setFaults(patch: Partial<SmsFaultSettings>): SmsFaultSettings;
  setInboundWebhookUrl(url: string | null): void;
  simulateInbound(text: InboundText): Promise<InboundResult>;
  stop(): Promise<void>;
}

const controlPatchSchema = smsFaultSettingsSchema
  .partial()
  .extend({ inboundWebhookUrl: z.url().nullable().optional() })
  .strict();

/** A text a customer sends: words, photos (MMS), or both. */
export type InboundText = { from: string; body: string; to?: string; media?: readonly FakeMedia[] };

/** Twilio takes up to 10 attachments per MMS. */
const MEDIA_LIMIT = 10;

const inboundSchema = z
  .object({
    from: z.string().trim().regex(/^\+[1-9]\d{6,14}$/, "from must be an E.164 number such as +15551234567"),
    body: z.string().max(1600).default(""),
    to: z.string().trim().optional(),
    // JSON callers: base64 bytes, or `missing: true` for media whose URL answers 404.
    media: z
      .array(z.object({ contentType: z.string().min(1), base64: z.string().optional(), missing: z.boolean().optional() }).strict())
      .max(MEDIA_LIMIT)
      .default([]),
    samplePhoto: z.union([z.boolean(), z.literal("on")]).optional(),
  });

/** The hand-operated form's photo chooser: one file, as large as an MMS gets. */
const formUpload = multer({ storage: multer.memoryStorage(), limits: { files: 1, fileSize: 5 * 1024 * 1024, fields: 5 } }).single("photo");

/** Twilio refuses bodies longer than this (error 21617). */
const BODY_LIMIT = 1600;

/** Twilio's 21610: the recipient texted STOP, so the carrier-side opt-out blocks every further send. */
const OPTED_OUT_CODE = 21610;

export async function startSmsGateway(options: SmsGatewayOptions): Promise<FakeSmsGateway> {
  const phoneNumber = options.phoneNumber ?? "+15005550006";
  let inboundWebhookUrl = options.inboundWebhookUrl ?? null;
  const log = new SmsLog();
  const faults = new SmsFaultPolicy(options.faults, options.random);
  const delivery = new DeliverySimulator(log, () => options.authToken, options.statusStepMs ?? 100);
  const optedOut = new Set<string>();
  const mediaStore = new MediaStore();
  let baseUrl = "";

  const sendError = (res: Response, error: TwilioErrorBody) => res.status(error.status).json(error);

  const simulateInbound = async (text: InboundText) => {
    if (!inboundWebhookUrl) throw new InboundNotConfigured();
    const change = optOutChange(text.body);
    if (change === "opt-out") optedOut.add(text.from);
    if (change === "opt-in") optedOut.delete(text.from);
    return deliverInbound({
      log,
      webhookUrl: inboundWebhookUrl,
      accountSid: options.accountSid,
      authToken: options.authToken,
      from: text.from,
      to: text.to || phoneNumber,
      body: text.body,
      media: text.media,
      mediaStore,
      baseUrl,
    });
  };

  const app = express();
  app.disable("x-powered-by");
  app.use(express.urlencoded({ extended: false }));
  // Inbound texts from tests may carry photos as base64.
  app.use(express.json({ limit: "20mb" }));

  // Everything under /2010-04-01 is the Twilio-shaped REST API: outage, latency and HTTP Basic auth first.
  const api = express.Router();
  let inLatency = 0;
  api.use(async (req, res, next) => {
    const outage = faults.outage();
    if (outage) return void sendError(res, outage);
    const latency = faults.latencyMs();
    if (latency > 0) {
      inLatency += 1;
      await new Promise((resolve) => setTimeout(resolve, latency));
      inLatency -= 1;
    }
    const credentials = parseBasicAuth(req.headers.authorization);
    if (!credentials || credentials.user !== options.accountSid || credentials.password !== options.authToken) {
      res.setHeader("WWW-Authenticate", 'Basic realm="Twilio API"');
      return void sendError(res, twilioError(401, 20003, "Authenticate"));
    }
    next();
  });

  api.post("/Accounts/:accountSid/Messages.json", (req, res) => {
    if (req.params.accountSid !== options.accountSid) {
      return void sendError(res, twilioError(404, 20404, `The requested resource /${TWILIO_API_VERSION}/Accounts/${req.params.accountSid}/Messages.json was not found`));
    }
    const form = (req.body ?? {}) as Record<string, string | undefined>;
    const to = form.To?.trim() ?? "";
    const body = form.Body ?? "";
    const messagingServiceSid = form.MessagingServiceSid?.trim() || null;
    const from = form.From?.trim() || (messagingServiceSid ? phoneNumber : "");
    if (!to) return void sendError(res, twilioError(400, 21604, "A 'To' phone number is required."));
    if (!from) return void sendError(res, twilioError(400, 21603, "A 'From' phone number is required."));
    if (!body) return void sendError(res, twilioError(400, 21602, "Message body is required."));
    if ([...body].length > BODY_LIMIT) {
      return void sendError(res, twilioError(400, 21617, "The concatenated message body exceeds the 1600 character limit."));
    }
    if (isInvalidNumber(to)) return void sendError(res, twilioError(400, 21211, `The 'To' number ${to} is not a valid phone number.`));
    if (optedOut.has(to)) {
      return void sendError(res, twilioError(400, OPTED_OUT_CODE, "Attempt to send to unsubscribed recipient"));
    }
    const fault = faults.sendFault(messagingServiceSid ?? from);
    if (fault) return void sendError(res, fault);

    const now = new Date().toISOString();
    const message = log.add({
      sid: newSid("SM"),
      accountSid: options.accountSid,
      direction: "outbound-api",
      to,
      from,
      messagingServiceSid,
      body,
      status: "queued",
      errorCode: null,
      statusCallback: form.StatusCallback?.trim() || null,
      dateCreated: now,
      dateUpdated: now,
      callbacks: [],
    });
    res.status(201).json(messageResource(message));
    delivery.start(message);
  });

  api.get("/Accounts/:accountSid/Messages.json", (req, res) => {
    const { matches, page } = listMessages(log.list(), String(req.params.accountSid), req.query);
    res.json({ messages: matches.map(messageResource), ...page });
  });

  api.get("/Accounts/:accountSid/Messages/:messageSid.json", (req, res) => {
    const message = log.get(String(req.params.messageSid));
    if (!message || message.accountSid !== req.params.accountSid) {
      return void sendError(res, twilioError(404, 20404, "The requested resource was not found"));
    }
    res.json(messageResource(message));
  });

  api.get("/Accounts/:accountSid/Messages/:messageSid/Media/:mediaSid", (req, res) => {
    const media = mediaStore.get(String(req.params.accountSid), String(req.params.messageSid), String(req.params.mediaSid));
    if (!media) return void sendError(res, twilioError(404, 20404, "The requested resource was not found"));
    res.type(media.contentType).send(media.data);
  });

  app.use(`/${TWILIO_API_VERSION}`, api);

  // Test and development controls, outside the Twilio shape.
  app.get("/__messages", (req, res) => {
    const to = typeof req.query.to === "string" ? req.query.to : null;
    const messages = log.list().filter((m) => !to || m.to === to);
    res.json({ messages });
  });
  app.delete("/__messages", (_req, res) => {
    log.clear();
    optedOut.clear();
    mediaStore.clear();
    res.status(204).end();
  });
  app.get("/__control", (_req, res) => {
    res.json({ ...faults.current(), inboundWebhookUrl });
  });
  app.post("/__control", (req, res) => {
    const parsed = controlPatchSchema.safeParse(req.body ?? {});
    if (!parsed.success) return void res.status(400).json({ error: z.prettifyError(parsed.error) });
    const { inboundWebhookUrl: newUrl, ...patch } = parsed.data;
    if (newUrl !== undefined) inboundWebhookUrl = newUrl;
    res.json({ ...faults.update(patch), inboundWebhookUrl });
  });
  app.get("/__inbound", (req, res) => {
    const from = typeof req.query.from === "string" ? req.query.from : "";
    res.type("html").send(renderInboundForm({ to: phoneNumber, webhookUrl: inboundWebhookUrl, from }));
  });
  app.post("/__inbound", (req, res, next) => (req.is("multipart/form-data") ? formUpload(req, res, next) : next()), async (req, res) => {
    // The hand-operated form posts a page form and wants a page back; tests post JSON and want JSON.
    const fromForm = Boolean(req.is("application/x-www-form-urlencoded") || req.is("multipart/form-data"));
    const parsed = inboundSchema.safeParse(req.body ?? {});
    if (!parsed.success) {
      const message = z.prettifyError(parsed.error);
      if (fromForm) return void res.status(400).type("html").send(renderInboundForm({ to: phoneNumber, webhookUrl: inboundWebhookUrl, error: message }));
      return void res.status(400).json({ error: message });
    }
    try {
      const { media: described, samplePhoto: wantsSample, ...text } = parsed.data;
      const media: FakeMedia[] = described.map((m) => ({ contentType: m.contentType, data: m.missing ? null : Buffer.from(m.base64 ?? "", "base64") }));
      if (req.file) media.push({ contentType: req.file.mimetype || "application/octet-stream", data: req.file.buffer });
      if (wantsSample) media.push(await samplePhoto());
      if (!text.body && media.length === 0) throw new EmptyText();
      const result = await simulateInbound({ ...text, media });
      if (fromForm) return void res.type("html").send(renderInboundResult(result, parsed.data.from));
      res.json(result);
    } catch (error) {
      const status = error instanceof InboundNotConfigured ? 409 : error instanceof EmptyText ? 400 : 502;
      const message = error instanceof Error ? error.message : String(error);
      if (fromForm) return void res.status(status).type("html").send(renderInboundForm({ to: phoneNumber, webhookUrl: inboundWebhookUrl, error: message }));
      res.status(status).json({ error: message });
    }
  });

  options.mount?.(app);

  // Malformed bodies get Twilio's error shape rather than Express's HTML page.
  app.use((error: unknown, _req: Request, res: Response, _next: NextFunction) => {
    const status = typeof (error as { status?: unknown }).status === "number" ? (error as { status: number }).status : 500;
    sendError(res, twilioError(status, status === 400 ? 20001 : 20500, error instanceof Error ? error.message : "Request failed"));
  });

  const running = await listenHttp(app, options.port ?? 0, options.host ?? "127.0.0.1");
  baseUrl = running.url;
  return {
    url: running.url,
    port: running.port,
    messages: () => log.list(),
    requestsInLatency: () => inLatency,
    clear: () => {
      log.clear();
      optedOut.clear();
      mediaStore.clear();
    },
    faults: () => faults.current(),
    setFaults: (patch) => faults.update(patch),
    setInboundWebhookUrl: (url) => {
      inboundWebhookUrl = url;
    },
    simulateInbound,
    stop: async () => {
      await delivery.stop();
      await running.close();
    },
  };
}

class EmptyText extends Error {
  constructor() {
    super("A text needs a body or a photo.");
  }
}

class InboundNotConfigured extends Error {
  constructor() {
    super("No inbound webhook URL is configured (FAKE_SMS_INBOUND_WEBHOOK_URL, or POST /__control {inboundWebhookUrl}).");
  }
}
