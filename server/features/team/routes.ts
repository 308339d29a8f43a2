import { changeRoleSchema, inviteStaffSchema, userIdParamSchema } from "#shared/schemas/team";
import type { AppDeps } from "../../app.ts";
import { auditSubject, route, type RouteSpec } from "../../http/route.ts";
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
      audit: "team.invited",
      body: inviteStaffSchema,
      handler: async ({ user, body, res }) => {
        const invited = await inviteStaff(deps, user, body);
        auditSubject(res, invited.member.id, { role: invited.member.role });
        res.status(201);
        return invited;
      },
    }),
    route({
      method: "patch",
      path: "/api/team/:userId",
      access: managerOnly,
      audit: "team.role_changed",
      params: userIdParamSchema,
      body: changeRoleSchema,
      handler: async ({ user, params, body, res }) => {
        const member = await changeRole(db, user, params.userId, body.role);
        auditSubject(res, params.userId, { role: body.role });
        return { member };
      },
    }),
    route({
      method: "post",
      path: "/api/team/:userId/deactivate",
      access: managerOnly,
      audit: "team.deactivated",
      params: userIdParamSchema,
      handler: async ({ user, params }) => ({ member: await deactivateStaff(db, user, params.userId) }),
    }),
  ];
}
