import { observationSchema, parsePlanInput, generatePlan, programSettingBounds } from "#shared/engine/index";
import { changeStepStateSchema, planIdParamsSchema, planStepParamsSchema } from "#shared/schemas/plans";
import { z } from "zod";
import type { AppDeps } from "../../app.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { findPlanForUser } from "./access.ts";
import { currentProgram } from "./program-repo.ts";
import * as plans from "./plans-repo.ts";
import * as steps from "./steps-repo.ts";
import { loadStoredPlan, regeneratePlan, todayView, type PlanChangeHook } from "./service.ts";

const staff = ["technician", "manager"] as const;
const everyone = ["customer", "technician", "manager"] as const;

/** The preview takes the engine's own input; the engine's parser gives the field errors. */
const previewBodySchema = z.object({ visit: z.unknown(), property: z.unknown(), program: z.unknown().optional(), options: z.unknown().optional(), placeRules: z.unknown().optional() });

export function planRoutes(deps: AppDeps, onChange?: PlanChangeHook): RouteSpec[] {
  const { db } = deps;
  return [
    route({
      method: "post",
      path: "/api/plans/preview",
      access: staff,
      body: previewBodySchema,
      handler: async ({ user, body }) => {
        const program = body.program ?? (await currentProgram(db, user.companyId));
        const parsed = parsePlanInput({ ...body, program });
        if (!parsed.ok) throw new HttpError(400, "invalid_input", "Some of the information is not valid.", parsed.fields);
        return { plan: generatePlan(parsed.value) };
      },
    }),
    route({
      method: "get",
      path: "/api/programs/current",
      access: staff,
      handler: async ({ user }) => {
        const settings = await currentProgram(db, user.companyId);
        return { version: settings.version, settings, bounds: programSettingBounds };
      },
    }),
    route({
      method: "get",
      path: "/api/my/plans",
      access: ["customer"],
      handler: async ({ user }) => ({ plans: await plans.plansOfCustomer(db, user.customerId ?? -1) }),
    }),
    route({
      method: "get",
      path: "/api/plans/:planId",
      access: everyone,
      audit: "plan.read",
      params: planIdParamsSchema,
      handler: async ({ user, params }) => ({ plan: await loadStoredPlan(db, params.planId, user) }),
    }),
    route({
      method: "get",
      path: "/api/plans/:planId/today",
      access: everyone,
      params: planIdParamsSchema,
      handler: async ({ user, params }) => {
        return todayView(db, user, params.planId);
      },
    }),
    route({
      method: "put",
      path: "/api/plans/:planId/steps/:stepId/state",
      access: everyone,
      audit: "plan.step_state_changed",
      params: planStepParamsSchema,
      body: changeStepStateSchema,
      handler: async ({ user, params, body }) => {
        await findPlanForUser(db, user, params.planId);
        const step = await steps.findStep(db, params.planId, params.stepId);
        if (!step) throw notFound("That step");
        const updated = await db.transaction(async (trx) => {
          const row = await steps.setStepState(trx, step.id, { state: body.state, reason: body.reason, byUserId: user.id });
          await onChange?.(trx, params.planId);
          return row;
        });
        return { step: steps.toStoredStep(updated) };
      },
    }),
    route({
      method: "post",
      path: "/api/plans/:planId/observations",
      access: everyone,
      audit: "plan.observation_added",
      params: planIdParamsSchema,
      body: observationSchema,
      handler: async ({ user, params, body }) => {
        await findPlanForUser(db, user, params.planId);
        await regeneratePlan(db, params.planId, { observation: body }, onChange);
        // With the reader, so a customer reporting sprouts gets the homeowner warnings only.
        return { plan: await loadStoredPlan(db, params.planId, user) };
      },
    }),
    route({
      method: "post",
      path: "/api/plans/:planId/regenerate",
      access: staff,
      audit: "plan.regenerated",
      params: planIdParamsSchema,
      handler: async ({ user, params }) => {
        await findPlanForUser(db, user, params.planId);
        await regeneratePlan(db, params.planId, {}, onChange);
        return { plan: await loadStoredPlan(db, params.planId, user) };
      },
    }),
  ];
}
