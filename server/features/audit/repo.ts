import type { Db } from "../../db.ts";
import type { AuditEntry } from "../../http/route.ts";

export async function recordAudit(db: Db, entry: AuditEntry): Promise<void> {
  await db("audit_log").insert({
    company_id: entry.user.companyId,
    actor_user_id: entry.user.id,
    action: entry.action,
    subject_type: entry.action.split(".")[0],
    subject_id: entry.subjectId,
    detail: JSON.stringify({ method: entry.method, path: entry.path }),
    ip: entry.ip ?? null,
  });
}

export type AuditRow = {
  id: string; at: Date; action: string; subject_type: string | null; subject_id: string | null;
  detail: { method?: string; path?: string }; ip: string | null; actor_name: string | null; actor_role: string | null;
};

export async function listAudit(db: Db, companyId: number, filter: { subjectType?: string; subjectId?: string; before?: number; limit: number }) {
  const query = db("audit_log")
    .leftJoin("users", "users.id", "audit_log.actor_user_id")
    .where("audit_log.company_id", companyId)
    .orderBy("audit_log.id", "desc")
    .limit(filter.limit)
    .select<AuditRow[]>("audit_log.id", "audit_log.at", "audit_log.action", "audit_log.subject_type", "audit_log.subject_id", "audit_log.detail", "audit_log.ip", "users.name as actor_name", "users.role as actor_role");
  if (filter.subjectType) query.andWhere("audit_log.subject_type", filter.subjectType);
  if (filter.subjectId) query.andWhere("audit_log.subject_id", filter.subjectId);
  if (filter.before) query.andWhere("audit_log.id", "<", filter.before);
  return query;
}
