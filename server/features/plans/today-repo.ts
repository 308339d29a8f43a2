import type DataLoader from "dataloader";
import type { Plan } from "#shared/engine/index";
import type { Db } from "../../db.ts";
import { headerQuery, toHeader, type PlanRow } from "./plans-repo.ts";
import { stepColumns, type StepRow } from "./steps-repo.ts";
import { batchedReads } from "../../lib/batched-reads.ts";

/** Steps the Today screen announces ahead of time as the next milestone. */
const milestoneKinds = ["mow", "check_in_photo", "feed"];

type StepJson = Omit<StepRow, "state_changed_at"> & { state_changed_at: string | null };

export type TodayRow = Parameters<typeof toHeader>[0] &
  Pick<PlanRow, "company_id" | "customer_id" | "hold_offs" | "warnings"> & {
    cautions: Plan["cautions"];
    today: string;
    steps: StepRow[];
    next_milestone: { kind: string; date: string; title: string } | null;
  };

type TodayQueryRow = Omit<TodayRow, "steps"> & { steps: StepJson[]; position: number };
type TodayAsk = { planId: number; now: Date };

/**
 * Everything the Today screen shows, in one round trip: Today is the homeowner's most frequent
 * request, and at load each extra query costs more than the work inside it. Requests arriving
 * together share that round trip (batchedReads). "Today" is the calendar date in the lawn's own
 * time zone at `now`; the steps come through the (plan_id, date) index, the caution texts only
 * out of the large figures document.
 */
export async function loadToday(db: Db, planId: number, now: Date): Promise<TodayRow | undefined> {
  let reads = todayReads.get(db);
  if (!reads) todayReads.set(db, (reads = batchedReads((asks) => readTodays(db, asks))));
  return reads.load({ planId, now });
}

const todayReads = new WeakMap<Db, DataLoader<TodayAsk, TodayRow | undefined>>();

async function readTodays(db: Db, asks: readonly TodayAsk[]): Promise<(TodayRow | undefined)[]> {
  const columns = stepColumns.join(", ");
  // As one JSON document, since knex would spread an array binding into a list of values.
  const asked = JSON.stringify(asks.map((a, i) => ({ plan_id: a.planId, at: a.now.toISOString(), position: i })));
  const rows = (await headerQuery(db)
    .joinRaw("join json_to_recordset(?::json) as asked(plan_id int, at timestamptz, position int) on asked.plan_id = care_plans.id", [asked])
    .joinRaw("cross join lateral (select (asked.at at time zone properties.time_zone)::date as local_today) as here")
    .select(
      "asked.position",
      "customers.company_id",
      "customers.id as customer_id",
      "care_plans.hold_offs",
      "care_plans.warnings",
      db.raw("care_plans.figures -> 'cautions' as cautions"),
      db.raw("to_char(here.local_today, 'YYYY-MM-DD') as today"),
      db.raw(
        `coalesce((select json_agg(s order by s.id) from (select ${columns} from plan_steps
           where plan_id = care_plans.id and date = here.local_today) as s), '[]') as steps`,
      ),
      db.raw(
        `(select json_build_object('kind', kind, 'date', date, 'title', title) from plan_steps
           where plan_id = care_plans.id and date > here.local_today and kind in (${milestoneKinds.map(() => "?").join(", ")})
           order by date, id limit 1) as next_milestone`,
        milestoneKinds,
      ),
    )
    // Prepared once per connection: planning this join costs more than running it.
    .options({ name: "plan-today" })) as TodayQueryRow[];
  const byPosition = new Map(rows.map(({ position, ...row }) => [position, toTodayRow(row)]));
  return asks.map((_, i) => byPosition.get(i));
}

// JSON carries the step's timestamp as text; the rest of the code expects the Date a column gives.
function toTodayRow(row: Omit<TodayQueryRow, "position">): TodayRow {
  return { ...row, steps: row.steps.map((s) => ({ ...s, state_changed_at: s.state_changed_at ? new Date(s.state_changed_at) : null })) };
}
