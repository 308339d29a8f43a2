/**
 * The server process: API, sign-in, and the two web apps.
 * `SERVE_APPS=vite` serves the apps through Vite with hot reload (npm run dev),
 * `SERVE_APPS=none` serves the API alone (fault tests); otherwise it serves the built apps from dist/.
 */
import "dotenv/config";
import { createServer } from "node:http";
import { configOrExit, processLogging } from "./lib/process-start.ts";
import { createDb } from "./db.ts";
import { createApp, type WebMode } from "./app.ts";
import { createMessenger } from "./messaging/create-messenger.ts";

const { logger, log } = processLogging("server");
const config = configOrExit(logger);

const db = createDb(config.DATABASE_URL);
const messenger = createMessenger(config);
const webModes: Record<string, WebMode> = { vite: "vite", none: "none" };
const web: WebMode = webModes[process.env.SERVE_APPS ?? ""] ?? "built";
const { app, close } = await createApp({ config, db, messenger, log, logger }, web);
const server = createServer(app);
server.listen(config.PORT, "127.0.0.1", () => {
  log(`listening on http://127.0.0.1:${config.PORT} (${config.NODE_ENV}, apps: ${web})`);
});

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  log(`${signal}: finishing in-flight requests, then stopping`);
  // A request that never finishes must not keep the process alive forever.
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  server.close(async () => {
    await close();
    await db.destroy();
    process.exit(0);
  });
  server.closeIdleConnections();
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
