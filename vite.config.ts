import { fileURLToPath } from "node:url";
import tailwindcss from "@tailwindcss/vite";
import react from "@vitejs/plugin-react";
import { defineConfig, type Plugin } from "vite";

const root = fileURLToPath(new URL(".", import.meta.url));
const apps = ["portal", "staff"] as const;

/**
 * One config, two apps. The build writes dist/portal/index.html and dist/staff/index.html
 * with shared hashed assets under dist/assets/. In development the Express server runs
 * Vite in middleware mode and serves each app's index.html itself.
 */
export default defineConfig({
  root,
  base: "/",
  plugins: [react(), tailwindcss(), standaloneDevFallback()],
  build: {
    outDir: "dist",
    emptyOutDir: true,
    rolldownOptions: {
      input: Object.fromEntries(apps.map((app) => [app, `${root}${app}/index.html`])),
    },
  },
});

/**
 * Only for a bare `npx vite` (no Express): deep links such as /staff/outbox get the app's
 * index.html, as the real server does. Skipped in middleware mode, where the server decides.
 */
function standaloneDevFallback(): Plugin {
  return {
    name: "sproutline-standalone-dev-fallback",
    apply: "serve",
    configureServer(server) {
      if (server.config.server.middlewareMode) return;
      server.middlewares.use((req, _res, next) => {
        const path = req.url?.split("?")[0] ?? "";
        const app = apps.find((name) => path === `/${name}` || path.startsWith(`/${name}/`));
        const wantsPage = req.method === "GET" && (req.headers.accept ?? "").includes("text/html") && !/\.\w+$/.test(path);
        if (app && wantsPage) req.url = `/${app}/index.html`;
        next();
      });
    },
  };
}
