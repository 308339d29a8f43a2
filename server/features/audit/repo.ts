import type { Db } from "../../db.ts";
import type { AuditEntry } from "../../http/route.ts";

export async function recordAudit(db: Db, entry: AuditEntry): Promise<void> {
  await db("audit_log").insert({
    company_id: entry.user.companyId,
    actor_user_id: entry.user.id,
    action: entry.action,
    subject_type: entry.action.split(".")[0],
    subject_id: entry.subjectId,
    detail: JSON.stringify({ ...entry.detail, method: entry.method, path: entry.path }),
    ip: entry.ip ?? null,
  });
}

export type AuditDetail = { method?: string; path?: string; name?: string; role?: string; created?: number; total?: number };

export type AuditRow = {
  id: string; at: Date; action: string; subject_type: string | null; subject_id: string | null;
  detail: AuditDetail; ip: string | null; actor_name: string | null; actor_role: string | null;
  /** Whose lawn the record is about, and where (plans, visits, follow-ups, questions, lawns, customers). */
  customer_name: string | null; street: string | null;
  /** A team member's or a place's name, as it is now. */
  subject_name: string | null;
};

/*
 * One page of entries first, then each joined to the person and lawn it is about, so the joins
 * run for at most `limit` rows and use primary keys. Ids are checked to be numbers before the
 * cast: a subject id is text (older entries, other kinds) and must not fail the query.
 */
const pageWithSubjects = `
  select page.*, actor.name as actor_name, actor.role as actor_role,
         c.first_name || ' ' || c.last_name as customer_name, p.street, coalesce(member.name, place.name) as subject_name
  from page
  left join users actor on actor.id = page.actor_user_id
  left join care_plans cp on page.subject_type = 'plan' and cp.id = page.subject_num
  left join service_visits sv on page.subject_type = 'visit' and sv.id = page.subject_num
  left join follow_up_visits fu on page.subject_type = 'follow_up' and fu.id = page.subject_num
  left join messages m on page.subject_type = 'question' and m.id = page.subject_num
  left join conversations conv on conv.id = m.conversation_id
  left join care_plans qcp on qcp.id = conv.plan_id
  left join properties p on p.id = coalesce(cp.property_id, sv.property_id, fu.property_id, qcp.property_id,
    case when page.subject_type = 'property' then page.subject_num end)
  left join customers c on c.id = coalesce(p.customer_id, case when page.subject_type = 'customer' then page.subject_num end)
  left join users member on page.subject_type = 'team' and member.id = page.subject_num
  left join place_rules place on page.subject_type = 'place' and place.id = page.subject_num and place.company_id = page.company_id
  order by page.id desc`;

export async function listAudit(db: Db, companyId: number, filter: { subjectType?: string; subjectId?: string; before?: number; limit: number }): Promise<AuditRow[]> {
  const page = db("audit_log")
    .where("company_id", companyId)
    .orderBy("id", "desc")
    .limit(filter.limit)
    .select("id", "at", "action", "subject_type", "subject_id", "detail", "ip", "actor_user_id", "company_id")
    .select(db.raw("case when subject_id ~ '^[0-9]{1,9}$' then subject_id::int end as subject_num"));
  if (filter.subjectType) page.andWhere("subject_type", filter.subjectType);
  if (filter.subjectId) page.andWhere("subject_id", filter.subjectId);
  if (filter.before) page.andWhere("id", "<", filter.before);
  const { sql, bindings } = page.toSQL();
  const { rows } = await db.raw<{ rows: AuditRow[] }>(`with page as (${sql}) ${pageWithSubjects}`, bindings);
  return rows;
}
