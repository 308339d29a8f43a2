import { auditQuerySchema } from "#shared/schemas/audit";
import type { Db } from "../../db.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { listAudit } from "./repo.ts";
import { auditSentence } from "./sentences.ts";

/** Managers see who on the staff read or changed which customer record, newest first. */
export function auditRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/audit",
      access: ["manager"],
      query: auditQuerySchema,
      handler: async ({ user, query }) => {
        const rows = await listAudit(db, user.companyId, query);
        return {
          entries: rows.map((r) => ({
            id: Number(r.id),
            at: r.at.toISOString(),
            action: r.action,
            sentence: auditSentence(r),
            subjectType: r.subject_type,
            subjectId: r.subject_id,
            customerName: r.customer_name,
            street: r.street,
            method: r.detail.method ?? null,
            path: r.detail.path ?? null,
            ip: r.ip,
            actorName: r.actor_name,
            actorRole: r.actor_role,
          })),
        };
      },
    }),
  ];
}
