import type { PlanStep } from "#shared/engine/index";
import type { StoredStep } from "#shared/schemas/plans";
import type { Db } from "../../db.ts";

export type StepRow = {
  id: number;
  plan_id: number;
  key: string;
  date: string;
  phase: StoredStep["phase"];
  kind: string;
  title: string;
  content: StepContent;
  state: StoredStep["state"];
  state_changed_at: Date | null;
  skip_reason: string | null;
};

/** What a step says beyond its date, kind and title; stored as one JSON value. */
type StepContent = Pick<StoredStep, "detail" | "times" | "minutesPerCycle" | "cycleAndSoak" | "heightIn" | "why" | "cautions"> & {
  feed?: PlanStep["feed"];
  restrictedBy?: PlanStep["restrictedBy"];
};

const contentOf = (s: PlanStep): StepContent => ({
  detail: s.detail,
  times: s.times ? [...s.times] : undefined,
  minutesPerCycle: s.minutesPerCycle,
  cycleAndSoak: s.cycleAndSoak ? { ...s.cycleAndSoak, cycleStarts: [...s.cycleAndSoak.cycleStarts] } : undefined,
  heightIn: s.heightIn,
  why: s.why,
  cautions: [...s.cautions],
  feed: s.feed,
  restrictedBy: s.restrictedBy,
});

export function toStoredStep(row: StepRow): StoredStep {
  const c = row.content;
  return {
    id: Number(row.id),
    key: row.key,
    date: row.date,
    phase: row.phase,
    kind: row.kind,
    title: row.title,
    detail: c.detail,
    ...(c.times ? { times: c.times } : {}),
    ...(c.minutesPerCycle !== undefined ? { minutesPerCycle: c.minutesPerCycle } : {}),
    ...(c.cycleAndSoak ? { cycleAndSoak: c.cycleAndSoak } : {}),
    ...(c.heightIn !== undefined ? { heightIn: c.heightIn } : {}),
    why: c.why,
    cautions: c.cautions,
    state: row.state,
    stateChangedAt: row.state_changed_at?.toISOString() ?? null,
    skipReason: row.skip_reason,
  };
}

/** Back to the engine's shape, with the homeowner's state, for recomputing. */
export function toEngineStep(row: StepRow): PlanStep {
  const c = row.content;
  return {
    key: row.key,
    date: row.date,
    phase: row.phase,
    kind: row.kind as PlanStep["kind"],
    title: row.title,
    detail: c.detail,
    ...(c.times ? { times: c.times } : {}),
    ...(c.minutesPerCycle !== undefined ? { minutesPerCycle: c.minutesPerCycle } : {}),
    ...(c.cycleAndSoak ? { cycleAndSoak: c.cycleAndSoak } : {}),
    ...(c.heightIn !== undefined ? { heightIn: c.heightIn } : {}),
    ...(c.feed ? { feed: c.feed } : {}),
    ...(c.restrictedBy ? { restrictedBy: c.restrictedBy } : {}),
    why: c.why,
    cautions: c.cautions as PlanStep["cautions"],
    ...(row.state !== "pending" ? { state: row.state } : {}),
  };
}

export const stepColumns = ["id", "plan_id", "key", "date", "phase", "kind", "title", "content", "state", "state_changed_at", "skip_reason"];

export async function stepsOfPlan(db: Db, planId: number): Promise<StepRow[]> {
  return db("plan_steps")
    .where({ plan_id: planId })
    .orderBy([{ column: "date" }, { column: "id" }])
    .select<StepRow[]>(stepColumns);
}

export async function stepsOfPlanOn(db: Db, planId: number, date: string): Promise<StepRow[]> {
  return db("plan_steps").where({ plan_id: planId, date }).orderBy("id").select<StepRow[]>(stepColumns);
}

export async function findStep(db: Db, planId: number, stepId: number): Promise<StepRow | undefined> {
  return db("plan_steps").where({ plan_id: planId, id: stepId }).first<StepRow | undefined>(stepColumns);
}

export async function setStepState(
  db: Db,
  stepId: number,
  change: { state: StoredStep["state"]; reason?: string; byUserId: number },
): Promise<StepRow> {
  const [row] = await db("plan_steps")
    .where({ id: stepId })
    .update({
      state: change.state,
      skip_reason: change.state === "skipped" ? (change.reason ?? null) : null,
      state_changed_at: change.state === "pending" ? null : db.fn.now(),
      state_changed_by: change.state === "pending" ? null : change.byUserId,
    })
    .returning<StepRow[]>(stepColumns);
  return row!;
}

/**
 * Makes the stored steps match a (re)computed plan in one pass, keyed by the engine's
 * stable step keys: steps the homeowner ticked off or skipped are never touched, pending
 * ones are updated or removed, new ones inserted. Running it twice changes nothing.
 */
export async function syncSteps(trx: Db, planId: number, steps: readonly PlanStep[]): Promise<void> {
  const existing = await trx("plan_steps").where({ plan_id: planId }).select<{ key: string; state: string }[]>("key", "state");
  const settled = new Set(existing.filter((r) => r.state !== "pending").map((r) => r.key));
  const wanted = steps.filter((s) => !settled.has(s.key));
  const wantedKeys = wanted.map((s) => s.key);

  await trx("plan_steps")
    .where({ plan_id: planId, state: "pending" })
    .whereNotIn("key", wantedKeys.length ? wantedKeys : [""])
    .delete();
  if (wanted.length === 0) return;
  const rows = wanted.map((s) => ({
    plan_id: planId,
    key: s.key,
    date: s.date,
    phase: s.phase,
    kind: s.kind,
    title: s.title,
    content: JSON.stringify(contentOf(s)),
    // A step the engine itself marks skipped (from a "skipped" observation) is stored so.
    state: s.state ?? "pending",
  }));
  for (let i = 0; i < rows.length; i += 500) {
    await trx("plan_steps")
      .insert(rows.slice(i, i + 500))
      .onConflict(["plan_id", "key"])
      .merge(["date", "phase", "kind", "title", "content", "state"]);
  }
}
