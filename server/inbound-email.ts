/**
 * The inbound e-mail process: `node --import tsx server/inbound-email.ts`, with the server's own
 * environment. It runs the SMTP listener that receives homeowners' replies (reply+<token>@
 * INBOUND_EMAIL_DOMAIN) and files them in their conversations. A process of its own rather than
 * part of server/main.ts: a port can be bound once per host, while server processes are meant to
 * run several side by side; the listener keeps nothing in memory either, so one per host (or
 * several hosts behind the domain's MX records) all work.
 */
import "dotenv/config";
import { configOrExit, processLogging } from "./lib/process-start.ts";
import { createDb } from "./db.ts";
import { createMessenger } from "./messaging/create-messenger.ts";
import { photoStorageFromConfig } from "./storage/index.ts";
import { startInboundSmtp } from "./features/email-replies/listener.ts";

const { logger, log } = processLogging("inbound-email");
const config = configOrExit(logger);

const db = createDb(config.DATABASE_URL, { min: 0, max: 5 });
const tls =
  config.INBOUND_SMTP_TLS_KEY && config.INBOUND_SMTP_TLS_CERT ? { keyFile: config.INBOUND_SMTP_TLS_KEY, certFile: config.INBOUND_SMTP_TLS_CERT } : undefined;
const listener = await startInboundSmtp(
  { db, storage: photoStorageFromConfig(config), messenger: createMessenger(config), inboundDomain: config.INBOUND_EMAIL_DOMAIN, log },
  {
    host: config.INBOUND_SMTP_HOST,
    port: config.INBOUND_SMTP_PORT,
    maxBytes: config.INBOUND_SMTP_MAX_BYTES,
    tls,
    onFiled: (outcome) => log(`e-mail ${outcome.kind}${"reason" in outcome ? ` (${outcome.reason})` : ""}`),
  },
);
log(`listening on ${config.INBOUND_SMTP_HOST}:${listener.port} for mail to @${config.INBOUND_EMAIL_DOMAIN}${tls ? " (STARTTLS offered)" : ""}`);

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  log(`${signal}: finishing e-mails in flight, then stopping`);
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  await listener.close();
  await db.destroy();
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
