/**
 * EXPLAIN (ANALYZE) of the hot queries, summarised as the plan nodes and the indexes they use.
 * The statements are the app's own, captured as its code runs them, so the summary cannot drift
 * from what the server really asks.
 */
import type { Knex } from "knex";
import { loadToday } from "../../server/features/plans/today-repo.ts";
import { plansOfCustomer } from "../../server/features/plans/plans-repo.ts";
import { openQuestions } from "../../server/features/questions/queue.ts";
import { sessionsWithUsers } from "../../server/auth/session-store.ts";

type PlanNode = { "Node Type": string; "Index Name"?: string; "Relation Name"?: string; Plans?: PlanNode[] };
type Statement = { sql: string; bindings: unknown[] };

function walk(node: PlanNode, out: string[]) {
  const target = node["Index Name"] ?? node["Relation Name"];
  out.push(target ? `${node["Node Type"]}(${target})` : node["Node Type"]);
  for (const child of node.Plans ?? []) walk(child, out);
}

/** Runs `work` and returns the statements it sent through knex, with knex's placeholders. */
async function captured(db: Knex, work: () => Promise<unknown>): Promise<Statement[]> {
  const statements: Statement[] = [];
  const listener = (q: { sql: string; bindings?: unknown[] }) => statements.push({ sql: q.sql.replace(/\$\d+/g, "?"), bindings: q.bindings ?? [] });
  db.on("query", listener);
  try {
    await work();
  } finally {
    db.off("query", listener);
  }
  return statements;
}

async function explain(db: Knex, { sql, bindings }: Statement) {
  const result = await db.raw(`explain (analyze, format json) ${sql}`, bindings as Knex.RawBinding[]);
  const root = result.rows[0]["QUERY PLAN"][0];
  const nodes: string[] = [];
  walk(root.Plan, nodes);
  return { executionMs: Number(root["Execution Time"].toFixed(2)), nodes, seqScans: nodes.filter((n) => n.startsWith("Seq Scan")) };
}

export async function explainSummary(db: Knex, ids: { planId: number; companyId: number; customerId: number; sessionId: string }) {
  // The array as PostgreSQL's literal, since knex would spread a JavaScript array into a list.
  const session: Statement = { sql: sessionsWithUsers.text.replace("$1", "?"), bindings: [`{${ids.sessionId}}`] };
  const hot: { name: string; statements: () => Promise<Statement[]> }[] = [
    { name: "session with its user (every signed-in request)", statements: async () => [session] },
    { name: "homeowner today", statements: () => captured(db, () => loadToday(db, ids.planId, new Date())) },
    { name: "plans of a customer", statements: () => captured(db, () => plansOfCustomer(db, ids.customerId)) },
    { name: "technician question queue", statements: () => captured(db, () => openQuestions(db, ids.companyId)) },
  ];
  const out = [];
  for (const q of hot) {
    try {
      for (const [i, statement] of (await q.statements()).entries()) {
        const e = await explain(db, statement);
        const name = i === 0 ? q.name : `${q.name} (${i + 1})`;
        out.push({ name, ...e, summary: `${e.executionMs} ms; ${e.nodes.join(" → ")}` });
      }
    } catch (err) {
      out.push({ name: q.name, executionMs: null, nodes: [], seqScans: [], summary: `not measured: ${(err as Error).message.split("\n")[0]}` });
    }
  }
  return out;
}
