import { callbackReportQuerySchema } from "#shared/schemas/callback-report";
import type { Db } from "../../db.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { callbackReport } from "./service.ts";

export function callbackReportRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/reports/callbacks",
      access: ["manager"],
      query: callbackReportQuerySchema,
      handler: async ({ user, query }) => ({ report: await callbackReport(db, user.companyId, query) }),
    }),
  ];
}
