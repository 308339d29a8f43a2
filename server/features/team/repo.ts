import type { TeamMember } from "#shared/schemas/team";
import type { Db } from "../../db.ts";

type Row = {
  id: number;
  name: string;
  email: string | null;
  phone: string | null;
  role: TeamMember["role"];
  active: boolean;
  google_sub: string | null;
  invited_at: Date | null;
  invited_by_name: string | null;
  deactivated_at: Date | null;
};

const toMember = (r: Row): TeamMember => ({
  id: r.id,
  name: r.name,
  email: r.email,
  phone: r.phone,
  role: r.role,
  active: r.active,
  hasSignedIn: r.google_sub !== null,
  invitedAt: r.invited_at?.toISOString() ?? null,
  invitedByName: r.invited_by_name,
  deactivatedAt: r.deactivated_at?.toISOString() ?? null,
});

function staffOf(db: Db, companyId: number) {
  return db("users as u")
    .leftJoin("users as inviter", "inviter.id", "u.invited_by")
    .where("u.company_id", companyId)
    .whereIn("u.role", ["technician", "manager"])
    .select<Row[]>("u.id", "u.name", "u.email", "u.phone", "u.role", "u.active", "u.google_sub", "u.invited_at", "inviter.name as invited_by_name", "u.deactivated_at");
}

export async function listTeam(db: Db, companyId: number): Promise<TeamMember[]> {
  return (await staffOf(db, companyId).orderBy([{ column: "u.active", order: "desc" }, { column: "u.name" }])).map(toMember);
}

export async function findMember(db: Db, companyId: number, userId: number): Promise<TeamMember | undefined> {
  const row = await staffOf(db, companyId).where("u.id", userId).first();
  return row ? toMember(row) : undefined;
}

/** Anyone with this address, in any company and any role: addresses are unique across users. */
export async function findAccountByEmail(db: Db, email: string) {
  return db("users").where({ email }).first<{ id: number; company_id: number; role: string; active: boolean } | undefined>("id", "company_id", "role", "active");
}

export async function insertStaff(trx: Db, row: { companyId: number; email: string; name: string; role: TeamMember["role"]; invitedBy: number }): Promise<number> {
  const [created] = await trx("users")
    .insert({ company_id: row.companyId, email: row.email, name: row.name, role: row.role, active: true, invited_by: row.invitedBy, invited_at: trx.fn.now() })
    .returning<{ id: number }[]>("id");
  return created!.id;
}

export async function reactivateStaff(trx: Db, userId: number, role: TeamMember["role"], invitedBy: number): Promise<void> {
  await trx("users").where({ id: userId }).update({ active: true, deactivated_at: null, role, invited_by: invitedBy, invited_at: trx.fn.now() });
}

export async function setRole(trx: Db, userId: number, role: TeamMember["role"]): Promise<void> {
  await trx("users").where({ id: userId }).update({ role });
}

export async function markDeactivated(trx: Db, userId: number): Promise<void> {
  await trx("users").where({ id: userId }).update({ active: false, deactivated_at: trx.fn.now() });
}

/**
 * The company's active managers, locked until the transaction ends: two managers changing
 * each other at the same moment (in two server processes) take turns, so the "keep one
 * manager" rule cannot be raced.
 */
export async function lockActiveManagers(trx: Db, companyId: number): Promise<number[]> {
  const rows = await trx("users").where({ company_id: companyId, role: "manager", active: true }).forUpdate().select<{ id: number }[]>("id");
  return rows.map((r) => r.id);
}
