import { planIdParamsSchema } from "#shared/schemas/plans";
import type { HomeownerViewResponse } from "#shared/schemas/homeowner-view";
import type { Db } from "../../db.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { findPlanForUser } from "../plans/access.ts";
import { homeownerOf, stepChangesOf } from "./repo.ts";

/**
 * Staff read the homeowner's Today and plan through the same routes the portal uses; this
 * adds only what the portal doesn't show: whose plan it is and who settled each step.
 */
export function homeownerViewRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/plans/:planId/homeowner-view",
      access: ["technician", "manager"],
      audit: "plan.read",
      params: planIdParamsSchema,
      handler: async ({ user, params }): Promise<HomeownerViewResponse> => {
        const plan = await findPlanForUser(db, user, params.planId);
        const [homeowner, stepChanges] = await Promise.all([homeownerOf(db, plan.customerId), stepChangesOf(db, plan.planId)]);
        return { homeowner, stepChanges };
      },
    }),
  ];
}
