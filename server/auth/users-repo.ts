import type { Db } from "../db.ts";
import type { SessionUser } from "./session-user.ts";

export type UserRow = {
  id: number;
  company_id: number;
  role: SessionUser["role"];
  name: string;
  email: string | null;
  phone: string | null;
  active: boolean;
  customer_id: number | null;
};

export function toSessionUser(row: UserRow): SessionUser {
  return {
    id: row.id,
    companyId: row.company_id,
    role: row.role,
    name: row.name,
    email: row.email,
    phone: row.phone,
    customerId: row.customer_id,
  };
}

function baseQuery(db: Db) {
  return db("users")
    .leftJoin("customers", "customers.user_id", "users.id")
    .select<UserRow[]>("users.id", "users.company_id", "users.role", "users.name", "users.email", "users.phone", "users.active", "customers.id as customer_id");
}

export async function findActiveUserById(db: Db, id: number): Promise<SessionUser | undefined> {
  const row = await baseQuery(db).where("users.id", id).andWhere("users.active", true).first();
  return row ? toSessionUser(row) : undefined;
}

export async function findUserByEmail(db: Db, email: string): Promise<(SessionUser & { active: boolean }) | undefined> {
  const row = await baseQuery(db).where("users.email", email).first();
  return row ? { ...toSessionUser(row), active: row.active } : undefined;
}

export async function findActiveCustomerByContact(
  db: Db,
  contact: { email?: string; phone?: string },
): Promise<SessionUser | undefined> {
  const query = baseQuery(db).where("users.role", "customer").andWhere("users.active", true);
  if (contact.email) query.andWhere("users.email", contact.email);
  else if (contact.phone) query.andWhere("users.phone", contact.phone);
  else return undefined;
  const row = await query.first();
  return row ? toSessionUser(row) : undefined;
}

export async function rememberGoogleSubject(db: Db, userId: number, subject: string): Promise<void> {
  await db("users").where({ id: userId }).whereNull("google_sub").update({ google_sub: subject });
}

export async function companyName(db: Db, companyId: number): Promise<string> {
  const row = await db("companies").where({ id: companyId }).first<{ name: string }>("name");
  return row?.name ?? "";
}

/** Ends every session of a user, e.g. on deactivation or "sign out everywhere". */
export async function deleteSessionsOfUser(db: Db, userId: number): Promise<number> {
  return db("sessions").whereRaw("(sess -> 'passport' ->> 'user') = ?", [String(userId)]).delete();
}
