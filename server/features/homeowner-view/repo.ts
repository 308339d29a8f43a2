import type { StepChange } from "#shared/schemas/homeowner-view";
import type { Db } from "../../db.ts";

export async function homeownerOf(db: Db, customerId: number) {
  const row = await db("customers as c")
    .join("users as u", "u.id", "c.user_id")
    .where("c.id", customerId)
    .first<{ first_name: string; last_name: string; phone: string | null; email: string | null }>("c.first_name", "c.last_name", "u.phone", "u.email");
  return { customerId, name: `${row!.first_name} ${row!.last_name}`, phone: row!.phone, email: row!.email };
}

/** Every done or skipped step of the plan with who settled it, in plan order. */
export async function stepChangesOf(db: Db, planId: number): Promise<StepChange[]> {
  const rows = await db("plan_steps as s")
    .leftJoin("users as u", "u.id", "s.state_changed_by")
    .where("s.plan_id", planId)
    .whereIn("s.state", ["done", "skipped"])
    .orderBy([{ column: "s.date" }, { column: "s.id" }])
    .select<{ id: string; state: "done" | "skipped"; state_changed_at: Date | null; name: string | null; role: StepChange["byRole"] }[]>(
      "s.id", "s.state", "s.state_changed_at", "u.name", "u.role",
    );
  return rows.map((r) => ({
    stepId: Number(r.id), state: r.state, changedAt: r.state_changed_at ? r.state_changed_at.toISOString() : null, byName: r.name, byRole: r.role,
  }));
}
