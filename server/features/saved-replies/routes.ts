import { idParamSchema } from "#shared/schemas/properties";
import { renderSavedReplySchema, savedReplyInputSchema } from "#shared/schemas/saved-replies";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import * as repo from "./repo.ts";
import { createReply, renderReply, updateReply } from "./service.ts";

const staff = ["technician", "manager"] as const;
const managerOnly = ["manager"] as const;

/** Technicians use the replies; the manager keeps the list. */
export function savedReplyRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/saved-replies",
      access: staff,
      handler: async ({ user }) => ({ replies: await repo.listReplies(db, user.companyId) }),
    }),
    route({
      method: "post",
      path: "/api/saved-replies",
      access: managerOnly,
      body: savedReplyInputSchema,
      handler: async ({ user, body, res }) => {
        res.status(201);
        return { reply: await createReply(db, user, body) };
      },
    }),
    route({
      method: "put",
      path: "/api/saved-replies/:id",
      access: managerOnly,
      params: idParamSchema,
      body: savedReplyInputSchema,
      handler: async ({ user, params, body }) => ({ reply: await updateReply(db, user, params.id, body) }),
    }),
    route({
      method: "delete",
      path: "/api/saved-replies/:id",
      access: managerOnly,
      params: idParamSchema,
      handler: async ({ user, params }) => {
        if (!(await repo.deleteReply(db, user.companyId, params.id))) throw notFound("That saved reply");
      },
    }),
    route({
      method: "post",
      path: "/api/saved-replies/:id/render",
      access: staff,
      params: idParamSchema,
      body: renderSavedReplySchema,
      handler: async ({ user, params, body }) => renderReply(db, user, params.id, body.planId),
    }),
  ];
}
