/**
 * The real app in its own process for the API benchmark, plus a bare Express "hello" route
 * in the same process as the baseline, ahead of all the app's middleware.
 * Environment as for server/main.ts.
 */
import express from "express";
import { createServer } from "node:http";
import { loadConfig } from "../../server/config.ts";
import { createDb } from "../../server/db.ts";
import { createApp } from "../../server/app.ts";
import { createMessenger } from "../../server/messaging/create-messenger.ts";

const config = loadConfig();
const db = createDb(config.DATABASE_URL, { min: 2, max: 20 });
const { app } = await createApp({ config, db, messenger: createMessenger(config), log: (m, e) => console.error(m, e) }, "none");
// The baseline: a bare Express app with one route. It gets its requests before the real app
// sees them, and the real app is the server's handler as in server/main.ts (mounting it under
// another Express app would add a second router and prototype swap to every request).
const bare = express();
bare.disable("x-powered-by");
bare.get("/bench/hello", (_req, res) => {
  res.json({ hello: "world" });
});
createServer((req, res) => (req.url === "/bench/hello" ? bare(req, res) : app(req, res))).listen(config.PORT, "127.0.0.1", () => process.stdout.write("ready\n"));
// A normal exit on SIGTERM, so `--cpu-prof` can write its profile.
process.on("SIGTERM", () => process.exit(0));
