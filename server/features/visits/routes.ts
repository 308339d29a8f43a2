import { idParamSchema } from "#shared/schemas/properties";
import { logVisitSchema, moveVisitSchema } from "#shared/schemas/visits";
import type { AppDeps } from "../../app.ts";
import { notFound } from "../../http/errors.ts";
import { auditSubject, route, type RouteSpec } from "../../http/route.ts";
import { findInCompany, mergeLawnFacts } from "../properties/repo.ts";
import { createPlanForVisit, regeneratePlan, type PlanChangeHook } from "../plans/service.ts";
import { planIdOfVisit } from "../plans/plans-repo.ts";
import { insertVisit, loadVisitWithProperty, moveVisit } from "./repo.ts";
import { noticeOfNewPlan } from "../notices/service.ts";

const staff = ["technician", "manager"] as const;

export function visitRoutes(deps: AppDeps, onChange?: PlanChangeHook): RouteSpec[] {
  const { db } = deps;
  return [
    route({
      method: "post",
      path: "/api/visits",
      access: staff,
      audit: "visit.logged",
      body: logVisitSchema,
      handler: async ({ user, body, res }) => {
        const property = await findInCompany(db, user.companyId, body.propertyId);
        if (!property) throw notFound("That property");
        const { date, services, ...details } = body.visit;
        // The visit and its whole plan land together or not at all.
        const created = await db.transaction(async (trx) => {
          // Condition, slope and shade seen today belong to the lawn; saved first so this visit's plan uses them.
          if (body.lawn) await mergeLawnFacts(trx, property.id, body.lawn);
          const visitId = await insertVisit(trx, {
            propertyId: property.id,
            technicianId: user.role === "technician" ? user.id : null,
            date,
            services,
            details,
            notes: body.notes,
            conditions: body.conditions,
            applicationRecord: body.applicationRecord,
          });
          const { planId } = await createPlanForVisit(trx, visitId, onChange);
          return { visitId, planId };
        });
        // The visit is saved either way; a welcome that can't be queued now is reported, not fatal. It goes out
        // after the gathering delay, inside the homeowner's allowed hours, on the channels they take messages on.
        const welcomeChannels = await noticeOfNewPlan(db, created.planId).catch((err) => {
          deps.log(`welcome for plan ${created.planId} could not be queued`, err);
          return [];
        });
        auditSubject(res, created.visitId);
        res.status(201).json({ ...created, invitationSent: welcomeChannels.length > 0, welcomeChannels });
      },
    }),
    route({
      method: "patch",
      path: "/api/visits/:id",
      access: staff,
      audit: "visit.moved",
      params: idParamSchema,
      body: moveVisitSchema,
      handler: async ({ user, params, body }) => {
        const visit = await loadVisitWithProperty(db, params.id);
        if (!visit || visit.companyId !== user.companyId) throw notFound("That visit");
        const planId = await planIdOfVisit(db, params.id);
        // The new date and the recomputed plan land together.
        await db.transaction(async (trx) => {
          await moveVisit(trx, params.id, body.date);
          if (planId) await regeneratePlan(trx, planId, {}, onChange);
        });
        return { visitId: params.id, planId: planId ?? null };
      },
    }),
  ];
}
