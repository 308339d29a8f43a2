/**
 * The real app in its own process for the API benchmark, plus a bare Express "hello" route
 * in the same process as the baseline: on an outer app, ahead of all the app's middleware.
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
const outer = express();
outer.disable("x-powered-by");
outer.get("/bench/hello", (_req, res) => {
  res.json({ hello: "world" });
});
outer.use(app);
createServer(outer).listen(config.PORT, "127.0.0.1", () => process.stdout.write("ready\n"));
// A normal exit on SIGTERM, so `--cpu-prof` can write its profile.
process.on("SIGTERM", () => process.exit(0));
