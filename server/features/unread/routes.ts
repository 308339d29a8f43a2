import type { UnreadResponse } from "#shared/schemas/unread";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { unreadByPlan } from "./repo.ts";

/**
 * The homeowner's unread count, a request of its own: the portal polls it for the Messages
 * tab and Today's notice, and it stays out of the Today query, the busiest one.
 */
export function unreadRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/my/unread",
      access: ["customer"],
      handler: async ({ user }): Promise<UnreadResponse> => {
        if (user.customerId === null) throw notFound("Your customer record");
        const plans = await unreadByPlan(db, user.customerId);
        return { plans, total: plans.reduce((sum, p) => sum + p.unread, 0) };
      },
    }),
  ];
}
