import { z } from "zod";
import type { AppDeps } from "../../app.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { getFeedUrl, renderFeed, rotateFeed, type CalendarDeps } from "./service.ts";

/** Calendar servers poll the feed; a few minutes of caching spares the database. */
const FEED_CACHE_SECONDS = 5 * 60;

function customerIdOf(user: SessionUser): number {
  if (user.customerId === null) throw new HttpError(403, "forbidden", "Your account cannot do this.");
  return user.customerId;
}

export function calendarRoutes(deps: Pick<AppDeps, "config" | "db">): RouteSpec[] {
  const calendar: CalendarDeps = { db: deps.db, secret: deps.config.SESSION_SECRET, publicUrl: deps.config.PUBLIC_URL };
  return [
    route({
      method: "get",
      path: "/api/my/calendar",
      access: ["customer"],
      // The answer is the feed's secret link.
      cache: "no-store",
      handler: async ({ user }) => ({ url: await getFeedUrl(calendar, customerIdOf(user)) }),
    }),
    route({
      method: "post",
      path: "/api/my/calendar/rotate",
      access: ["customer"],
      handler: async ({ user }) => ({ url: await rotateFeed(calendar, customerIdOf(user)) }),
    }),
    // Public by design: calendar apps cannot sign in. The 256-bit token in the path is the key.
    // The whole last segment is one parameter ("<token>.ics"), so even "/calendar/.ics"
    // reaches the handler and gets the JSON 404.
    route({
      method: "get",
      path: "/calendar/:file",
      access: "public",
      params: z.object({ file: z.string() }),
      handler: async ({ params, res }) => {
        const token = params.file.endsWith(".ics") ? params.file.slice(0, -".ics".length) : "";
        const feed = await renderFeed(calendar, token);
        if (!feed) throw notFound("That calendar");
        res.set({
          "Content-Type": "text/calendar; charset=utf-8",
          "Content-Disposition": 'inline; filename="lawn-care-plan.ics"',
          "Cache-Control": `private, max-age=${FEED_CACHE_SECONDS}`,
          "X-Robots-Tag": "noindex",
        });
        res.send(feed);
        return undefined;
      },
    }),
    // "/calendar" and "/calendar/" are outside /api, where no JSON 404 catches them otherwise.
    route({
      method: "get",
      path: "/calendar",
      access: "public",
      handler: () => {
        throw notFound("That calendar");
      },
    }),
  ];
}
