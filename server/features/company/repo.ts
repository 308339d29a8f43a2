import type { Db } from "../../db.ts";

export type CompanyRow = { id: number; name: string; phone: string | null; logo_key: string | null; logo_updated_at: Date | null };

const columns = ["id", "name", "phone", "logo_key", "logo_updated_at"] as const;

export async function findCompany(db: Db, companyId: number): Promise<CompanyRow | undefined> {
  return db("companies").where({ id: companyId }).first<CompanyRow | undefined>(...columns);
}

/** One company per deployment for now: the oldest one is the one signed-out visitors see. */
export async function firstCompany(db: Db): Promise<CompanyRow | undefined> {
  return db("companies").orderBy("id").first<CompanyRow | undefined>(...columns);
}

export async function updatePhone(db: Db, companyId: number, phone: string | null): Promise<void> {
  await db("companies").where({ id: companyId }).update({ phone });
}

/** Swaps in the new logo and hands back the key it replaced, so its file can be removed. */
export async function replaceLogoKey(db: Db, companyId: number, logoKey: string): Promise<string | null> {
  return db.transaction(async (trx) => {
    const before = await trx("companies").where({ id: companyId }).forUpdate().first<{ logo_key: string | null }>("logo_key");
    await trx("companies").where({ id: companyId }).update({ logo_key: logoKey, logo_updated_at: trx.fn.now() });
    return before?.logo_key ?? null;
  });
}
