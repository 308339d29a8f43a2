import { changeRoleSchema, inviteStaffSchema, userIdParamSchema } from "#shared/schemas/team";
import type { AppDeps } from "../../app.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { listTeam } from "./repo.ts";
import { changeRole, deactivateStaff, inviteStaff } from "./service.ts";

const managerOnly = ["manager"] as const;

export function teamRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  return [
    route({
      method: "get",
      path: "/api/team",
      access: managerOnly,
      handler: async ({ user }) => ({ members: await listTeam(db, user.companyId) }),
    }),
    route({
      method: "post",
      path: "/api/team/invitations",
      access: managerOnly,
      body: inviteStaffSchema,
      handler: async ({ user, body, res }) => {
        res.status(201);
        return inviteStaff(deps, user, body);
      },
    }),
    route({
      method: "patch",
      path: "/api/team/:userId",
      access: managerOnly,
      params: userIdParamSchema,
      body: changeRoleSchema,
      handler: async ({ user, params, body }) => ({ member: await changeRole(db, user, params.userId, body.role) }),
    }),
    route({
      method: "post",
      path: "/api/team/:userId/deactivate",
      access: managerOnly,
      params: userIdParamSchema,
      handler: async ({ user, params }) => ({ member: await deactivateStaff(db, user, params.userId) }),
    }),
  ];
}
