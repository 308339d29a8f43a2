import type { NextFunction, Request, Response } from "express";
import { questionTextSchema } from "#shared/schemas/questions";
import { answerPhotoLimit, answerSchema } from "#shared/schemas/answers";
import { planIdParamsSchema } from "#shared/schemas/plans";
import type { Role } from "#shared/schemas/auth";
import type { AppDeps } from "../../app.ts";
import { HttpError } from "../../http/errors.ts";
import { checkAccess, route, type RouteSpec } from "../../http/route.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { photoStorageFromConfig, type PhotoStorage } from "../../storage/index.ts";
import { findPlanForUser } from "../plans/access.ts";
import { photoUpload, uploadedBuffers } from "../photos/upload.ts";
import { answerQuestion, askQuestion, readThread, type QuestionDeps } from "./service.ts";
import { assignQuestion, openQuestions } from "./queue.ts";
import { answeredQuestionsQuerySchema, assignQuestionSchema, questionMessageParamsSchema } from "#shared/schemas/question-queue";
import { recentlyAnswered } from "./answered.ts";
import { noticeOfAnswer, openQuestionCameBySms } from "../notices/service.ts";

const customerOnly = ["customer"] as const satisfies readonly Role[];
const staff = ["technician", "manager"] as const satisfies readonly Role[];
const everyone = ["customer", "technician", "manager"] as const satisfies readonly Role[];

/**
 * Runs before the upload is parsed: strangers and other customers are refused before the
 * server buffers megabytes of photos for them. The handler checks the plan again itself.
 */
function planGuard(db: AppDeps["db"], access: readonly Role[]) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const user = req.user as SessionUser | undefined;
    checkAccess(access, user);
    const params = planIdParamsSchema.safeParse(req.params);
    if (!params.success) throw new HttpError(400, "invalid_input", "Some of the information is not valid.", { "params.planId": "Invalid plan id" });
    await findPlanForUser(db, user, params.data.planId);
    next();
  };
}

export function questionRoutes(deps: Pick<AppDeps, "config" | "db" | "log">, storage: PhotoStorage = photoStorageFromConfig(deps.config)): RouteSpec[] {
  const service: QuestionDeps = { db: deps.db, storage };
  return [
    route({
      method: "get",
      path: "/api/questions/open",
      access: staff,
      handler: async ({ user }) => ({ questions: await openQuestions(deps.db, user.companyId) }),
    }),
    route({
      method: "get",
      path: "/api/questions/answered",
      access: staff,
      query: answeredQuestionsQuerySchema,
      handler: async ({ user, query }) => ({ days: query.days, questions: await recentlyAnswered(deps.db, user.companyId, query.days) }),
    }),
    route({
      method: "post",
      path: "/api/questions/:messageId/assign",
      access: staff,
      audit: "question.assigned",
      params: questionMessageParamsSchema,
      body: assignQuestionSchema,
      handler: async ({ user, params, body }) => assignQuestion(deps.db, user, params.messageId, body.userId),
    }),
    route({
      method: "get",
      path: "/api/plans/:planId/thread",
      access: everyone,
      audit: "plan.thread_read",
      params: planIdParamsSchema,
      handler: async ({ user, params }) => readThread(service, user, await findPlanForUser(deps.db, user, params.planId)),
    }),
    route({
      method: "post",
      path: "/api/plans/:planId/questions",
      access: customerOnly,
      params: planIdParamsSchema,
      body: questionTextSchema,
      before: [planGuard(deps.db, customerOnly), photoUpload()],
      handler: async ({ req, res, user, params, body }) => {
        const plan = await findPlanForUser(deps.db, user, params.planId);
        const message = await askQuestion(service, user, plan, body.text, uploadedBuffers(req));
        res.status(201);
        return { message };
      },
    }),
    route({
      method: "post",
      path: "/api/plans/:planId/answers",
      access: staff,
      audit: "plan.question_answered",
      params: planIdParamsSchema,
      body: answerSchema,
      before: [planGuard(deps.db, staff), photoUpload(answerPhotoLimit)],
      handler: async ({ req, res, user, params, body }) => {
        const plan = await findPlanForUser(deps.db, user, params.planId);
        // Asked before the answer is stored: afterwards every question counts as answered.
        const viaSms = await openQuestionCameBySms(deps.db, plan.planId);
        const message = await answerQuestion(service, user, plan, body.text, body.resolve ?? false, uploadedBuffers(req));
        await noticeOfAnswer(deps.db, plan.planId, viaSms).catch((err) => deps.log(`answer notice for plan ${plan.planId} could not be queued`, err));
        res.status(201);
        return { message };
      },
    }),
  ];
}
