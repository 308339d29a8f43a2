import { idParamSchema } from "#shared/schemas/properties";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { listUnmatched, markHandled } from "./repo.ts";

const managerOnly = ["manager"] as const;

/** Texts and e-mails from senders we couldn't match: managers follow them up. */
export function unmatchedInboundRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/unmatched-inbound",
      access: managerOnly,
      audit: "unmatched_inbound.read",
      handler: async ({ user }) => ({ items: await listUnmatched(db, user.companyId) }),
    }),
    route({
      method: "post",
      path: "/api/unmatched-inbound/:id/handled",
      access: managerOnly,
      audit: "unmatched_inbound.handled",
      params: idParamSchema,
      handler: async ({ user, params }) => {
        const item = await markHandled(db, user.companyId, params.id, user.id);
        if (!item) throw notFound("That message");
        return { item };
      },
    }),
  ];
}
