import express, { type Express } from "express";
import { existsSync, readFileSync } from "node:fs";
import { resolve } from "node:path";
import type { ViteDevServer } from "vite";

const repoRoot = resolve(import.meta.dirname, "../..");
const apps = ["portal", "staff"] as const;

/** Production: the built apps from dist/, each a single-page app under its own prefix. */
export function serveBuiltApps(app: Express, distDir = resolve(repoRoot, "dist")) {
  if (!existsSync(resolve(distDir, "portal/index.html"))) {
    throw new Error(`The apps are not built (${distDir} is missing); run \`npm run build\` first.`);
  }
  app.use(express.static(distDir, { index: false, maxAge: "1h", immutable: false }));
  for (const name of apps) {
    const html = readFileSync(resolve(distDir, name, "index.html"), "utf8");
    app.get([`/${name}`, `/${name}/*rest`], (_req, res) => {
      res.setHeader("Cache-Control", "no-cache");
      res.type("html").send(html);
    });
  }
}

/** Development: Vite in middleware mode behind the same Express server, with hot reload. */
export async function serveWithVite(app: Express): Promise<ViteDevServer> {
  const { createServer } = await import("vite");
  const vite = await createServer({ root: repoRoot, server: { middlewareMode: true }, appType: "custom" });
  app.use(vite.middlewares);
  for (const name of apps) {
    app.get([`/${name}`, `/${name}/*rest`], async (req, res, next) => {
      try {
        const template = readFileSync(resolve(repoRoot, name, "index.html"), "utf8");
        const html = await vite.transformIndexHtml(req.originalUrl, template);
        res.type("html").send(html);
      } catch (err) {
        vite.ssrFixStacktrace(err as Error);
        next(err);
      }
    });
  }
  return vite;
}
