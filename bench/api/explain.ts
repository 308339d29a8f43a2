/** EXPLAIN (ANALYZE) of the hot queries, summarised as the plan nodes and the indexes they use. */
import type { Knex } from "knex";

type PlanNode = { "Node Type": string; "Index Name"?: string; "Relation Name"?: string; Plans?: PlanNode[] };

function walk(node: PlanNode, out: string[]) {
  const target = node["Index Name"] ?? node["Relation Name"];
  out.push(target ? `${node["Node Type"]}(${target})` : node["Node Type"]);
  for (const child of node.Plans ?? []) walk(child, out);
}

async function explain(db: Knex, sql: string, bindings: unknown[]) {
  const result = await db.raw(`explain (analyze, format json) ${sql}`, bindings as Knex.RawBinding[]);
  const root = result.rows[0]["QUERY PLAN"][0];
  const nodes: string[] = [];
  walk(root.Plan, nodes);
  return { executionMs: Number(root["Execution Time"].toFixed(2)), nodes, seqScans: nodes.filter((n) => n.startsWith("Seq Scan")) };
}

export async function explainSummary(db: Knex, ids: { planId: number; companyId: number }) {
  const queries = [
    { name: "plan steps of a plan", sql: "select * from plan_steps where plan_id = ? order by date, id", bindings: [ids.planId] },
    { name: "plan progress (lateral count)", sql: "select count(*) filter (where state = 'done') from plan_steps where plan_id = ?", bindings: [ids.planId] },
    { name: "plans of a customer", sql: "select cp.id from care_plans cp join properties p on p.id = cp.property_id where p.customer_id = (select customer_id from properties where id = (select property_id from care_plans where id = ?))", bindings: [ids.planId] },
    { name: "open questions of a company", sql: "select m.id from messages m join conversations c on c.id = m.conversation_id join care_plans cp on cp.id = c.plan_id join properties p on p.id = cp.property_id join customers cu on cu.id = p.customer_id where m.kind = 'question' and m.resolved_at is null and cu.company_id = ? order by m.created_at limit 100", bindings: [ids.companyId] },
  ];
  const out = [];
  for (const q of queries) {
    try {
      const e = await explain(db, q.sql, q.bindings);
      out.push({ name: q.name, ...e, summary: `${e.executionMs} ms; ${e.nodes.join(" → ")}` });
    } catch (err) {
      out.push({ name: q.name, executionMs: null, nodes: [], seqScans: [], summary: `not measured: ${(err as Error).message.split("\n")[0]}` });
    }
  }
  return out;
}
