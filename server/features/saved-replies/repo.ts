import type { SavedReply } from "#shared/schemas/saved-replies";
import type { Db } from "../../db.ts";

type Row = { id: number; title: string; body: string; updated_at: Date; created_by_name: string | null };

const toReply = (r: Row): SavedReply => ({ id: r.id, title: r.title, body: r.body, updatedAt: r.updated_at.toISOString(), createdByName: r.created_by_name });

function ofCompany(db: Db, companyId: number) {
  return db("saved_replies as r")
    .leftJoin("users as author", "author.id", "r.created_by")
    .where("r.company_id", companyId)
    .select<Row[]>("r.id", "r.title", "r.body", "r.updated_at", "author.name as created_by_name");
}

export async function listReplies(db: Db, companyId: number): Promise<SavedReply[]> {
  return (await ofCompany(db, companyId).orderBy("r.title")).map(toReply);
}

export async function findReply(db: Db, companyId: number, id: number): Promise<SavedReply | undefined> {
  const row = await ofCompany(db, companyId).where("r.id", id).first();
  return row ? toReply(row) : undefined;
}

export async function insertReply(db: Db, row: { companyId: number; title: string; body: string; createdBy: number }): Promise<number> {
  const [created] = await db("saved_replies")
    .insert({ company_id: row.companyId, title: row.title, body: row.body, created_by: row.createdBy })
    .returning<{ id: number }[]>("id");
  return created!.id;
}

/** Returns false when the reply is not the company's. */
export async function updateReply(db: Db, companyId: number, id: number, change: { title: string; body: string }): Promise<boolean> {
  const count = await db("saved_replies").where({ id, company_id: companyId }).update({ ...change, updated_at: db.fn.now() });
  return count > 0;
}

export async function deleteReply(db: Db, companyId: number, id: number): Promise<boolean> {
  return (await db("saved_replies").where({ id, company_id: companyId }).delete()) > 0;
}

/** What the placeholders of a plan's reply are filled from. */
export async function planFacts(db: Db, planId: number) {
  return db("care_plans as cp")
    .join("service_visits as v", "v.id", "cp.visit_id")
    .join("properties as p", "p.id", "cp.property_id")
    .join("customers as c", "c.id", "p.customer_id")
    .join("companies as co", "co.id", "c.company_id")
    .where("cp.id", planId)
    .first<{ first_name: string; visit_date: string; first_mow_date: string | null; company_name: string; grass_type: unknown; seed_mix: unknown }>(
      "c.first_name",
      "v.visit_date",
      db.raw("cp.figures -> 'meta' ->> 'firstMowDate' as first_mow_date"),
      "co.name as company_name",
      // What the lawn grows and what was sown: a reply naming another grass gets flagged.
      db.raw("p.lawn -> 'grassType' as grass_type"),
      db.raw("v.details -> 'seedMix' as seed_mix"),
    );
}
