import type { Db } from "../../db.ts";
import { route, type RouteSpec } from "../../http/route.ts";

export function healthRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/health",
      access: "public",
      handler: async ({ res }) => {
        const started = performance.now();
        try {
          await db.raw("select 1");
          return { status: "ok", database: { reachable: true, latencyMs: Math.round(performance.now() - started) } };
        } catch {
          res.setHeader("Retry-After", "5");
          res.status(503).json({ status: "degraded", database: { reachable: false } });
          return;
        }
      },
    }),
  ];
}
