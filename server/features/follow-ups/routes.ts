import { anotherDaySchema, createFollowUpSchema, followUpFilterSchema, followUpListQuerySchema, updateFollowUpSchema } from "#shared/schemas/follow-ups";
import { idParamSchema } from "#shared/schemas/properties";
import { planIdParamsSchema } from "#shared/schemas/plans";
import type { Role } from "#shared/schemas/auth";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { auditSubject, route, type RouteSpec } from "../../http/route.ts";
import { findPlanForUser } from "../plans/access.ts";
import { followUpsCsv } from "./csv.ts";
import { askForAnotherDay, confirmVisit, visitsOfPlan } from "./homeowner.ts";
import * as repo from "./repo.ts";
import { createFollowUp, updateFollowUp } from "./service.ts";

const staff = ["technician", "manager"] as const satisfies readonly Role[];
const everyone = ["customer", "technician", "manager"] as const satisfies readonly Role[];
const customerOnly = ["customer"] as const satisfies readonly Role[];

/** More rows than a season's follow-ups; a filter narrows anything bigger. */
export const CSV_EXPORT_MAX_ROWS = 10_000;

export function followUpRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/follow-ups",
      access: staff,
      query: followUpListQuerySchema,
      handler: async ({ user, query }) => {
        const { limit, offset, ...filter } = query;
        return repo.listFollowUps(db, user.companyId, filter, { limit, offset });
      },
    }),
    route({
      method: "get",
      path: "/api/follow-ups.csv",
      access: staff,
      query: followUpFilterSchema,
      handler: async ({ user, query, res }) => {
        const rows = await repo.exportFollowUps(db, user.companyId, query, CSV_EXPORT_MAX_ROWS);
        res.setHeader("Content-Type", "text/csv; charset=utf-8");
        res.setHeader("Content-Disposition", 'attachment; filename="follow-up-visits.csv"');
        res.send(followUpsCsv(rows));
      },
    }),
    route({
      method: "get",
      path: "/api/follow-ups/:id",
      access: staff,
      params: idParamSchema,
      handler: async ({ user, params }) => {
        const followUp = await repo.findFollowUp(db, user.companyId, params.id);
        if (!followUp) throw notFound("That follow-up");
        return { followUp };
      },
    }),
    route({
      method: "post",
      path: "/api/follow-ups",
      access: staff,
      audit: "follow_up.created",
      body: createFollowUpSchema,
      handler: async ({ user, body, res }) => {
        const followUp = await createFollowUp(db, user, body);
        auditSubject(res, followUp.id);
        res.status(201);
        return { followUp };
      },
    }),
    route({
      method: "patch",
      path: "/api/follow-ups/:id",
      access: staff,
      audit: "follow_up.updated",
      params: idParamSchema,
      body: updateFollowUpSchema,
      handler: async ({ user, params, body }) => ({ followUp: await updateFollowUp(db, user, params.id, body) }),
    }),
    // The homeowner's side: their plan's visits (staff see them as the homeowner does), and their answers.
    route({
      method: "get",
      path: "/api/plans/:planId/visits",
      access: everyone,
      params: planIdParamsSchema,
      handler: async ({ user, params }) => {
        const plan = await findPlanForUser(db, user, params.planId);
        return { visits: await visitsOfPlan(db, plan) };
      },
    }),
    route({
      method: "post",
      path: "/api/follow-ups/:id/confirm",
      access: customerOnly,
      params: idParamSchema,
      handler: async ({ user, params }) => ({ visit: await confirmVisit(db, user, params.id) }),
    }),
    route({
      method: "post",
      path: "/api/follow-ups/:id/another-day",
      access: customerOnly,
      params: idParamSchema,
      body: anotherDaySchema,
      handler: async ({ user, params, body }) => ({ visit: await askForAnotherDay(db, user, params.id, body) }),
    }),
  ];
}
