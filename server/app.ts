import express, { type Express } from "express";
import type { Config } from "./config.ts";
import type { Db } from "./db.ts";
import type { Messenger } from "./messaging/messenger.ts";
import { createSessionMiddleware } from "./auth/sessions.ts";
import { createPassport } from "./auth/passport.ts";
import { userFromSession } from "./auth/request-user.ts";
import { apiNotFound, errorHandler } from "./http/errors.ts";
import { requestLogger } from "./http/request-log.ts";
import { createLogger, type Logger } from "./lib/logger.ts";
import { securityHeaders } from "./web/security-headers.ts";
import { compressWherePays } from "./web/compress.ts";
import { buildRouter } from "./http/route.ts";
import { requireSameOrigin } from "./http/same-origin.ts";
import { privateApiAnswers } from "./http/cache-control.ts";
import { createRateLimit, limitSpecs } from "./http/rate-limits.ts";
import { recordAudit } from "./features/audit/repo.ts";
import { collectRoutes } from "./routes.ts";
import { googleSignInRouter } from "./features/auth/routes.ts";
import { serveBuiltApps, serveWithVite } from "./web/serve-apps.ts";

export type AppDeps = {
  config: Config;
  db: Db;
  messenger: Messenger;
  log: (message: string, err?: unknown) => void;
  /** Request lines go here; without one, the process's own "server" logger (silent under test). */
  logger?: Logger;
};

export type BuiltApp = { app: Express; close: () => Promise<void> };

/** How the two web apps are served: built files, Vite with hot reload, or not at all (API tests). */
export type WebMode = "built" | "vite" | "none";

/**
 * Builds the Express app without listening, so tests can drive it with supertest and
 * main.ts can add the web apps and a listener. Keeps no per-user state in memory.
 */
export async function createApp(deps: AppDeps, web: WebMode = "none"): Promise<BuiltApp> {
  const { config } = deps;
  const app = express();
  app.disable("x-powered-by");
  app.set("trust proxy", config.TRUST_PROXY);
  // First, so every answer (even a refused one) carries its request id and gets its log line.
  app.use(requestLogger(deps.logger ?? createLogger("server")));
  app.use(securityHeaders(config.NODE_ENV === "development"));
  app.use("/api", privateApiAnswers());
  app.use(compressWherePays());
  app.use(requireSameOrigin(config.PUBLIC_URL));
  app.use(express.json({ limit: "100kb" }));
  app.use(express.urlencoded({ extended: false, limit: "100kb" }));

  const sessions = createSessionMiddleware(config);
  const passport = createPassport(config, deps.db);
  app.use(sessions.middleware);
  app.use(userFromSession());
  // passport's login and logout, only where people sign in and out (Google's routes get theirs from passport.authenticate).
  app.use(["/api/auth/link/consume", "/api/auth/sign-out"], passport.initialize());

  app.use(["/api/auth/link", "/api/auth/link/consume"], createRateLimit(deps.db, limitSpecs.signIn));
  app.post("/api/plans/:planId/questions", createRateLimit(deps.db, limitSpecs.uploads));
  app.use("/api/webhooks", createRateLimit(deps.db, limitSpecs.webhooks));
  app.use(googleSignInRouter(passport));
  app.use(
    buildRouter(collectRoutes(deps), {
      audit: (entry) => void recordAudit(deps.db, entry).catch((err) => deps.log("could not write the audit log", err)),
    }),
  );
  app.use("/api", apiNotFound);

  const vite = web === "vite" ? await serveWithVite(app) : undefined;
  if (web === "built") serveBuiltApps(app);
  app.get("/", (_req, res) => res.redirect("/portal/"));
  app.use(errorHandler(deps.log));

  return {
    app,
    close: async () => {
      await vite?.close();
      await sessions.close();
    },
  };
}
