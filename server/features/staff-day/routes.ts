import { staffDayQuerySchema } from "#shared/schemas/staff-day";
import type { Db } from "../../db.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { staffDay } from "./service.ts";

export function staffDayRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/staff/day",
      access: ["technician", "manager"],
      query: staffDayQuerySchema,
      handler: async ({ user, query }) => staffDay(db, user, query),
    }),
  ];
}
