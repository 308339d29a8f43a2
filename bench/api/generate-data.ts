/**
 * Fills a bench database to the size of a busy company: 50,000 homeowners, each with a lawn,
 * a seeding visit and a care plan of 60 steps (3 million steps), a session each, plus open
 * questions with a photo each, a third of them answered.
 * Done in SQL with generate_series; the plan content is one real engine plan repeated.
 */
import type { Knex } from "knex";
import { generatePlan, parsePlanInput } from "../../shared/engine/index.ts";
import { overseedingVisit } from "../../shared/engine/testing/fixtures.ts";

export const benchSize = { customers: 50_000, stepsPerPlan: 60 };

export async function generateBenchData(db: Knex, companyId: number): Promise<void> {
  const parsed = parsePlanInput(overseedingVisit());
  if (!parsed.ok) throw new Error("fixture invalid");
  const plan = generatePlan(parsed.value);
  // The fixture plan's own steps (its kinds, texts and spacing), repeated to make 60 a plan.
  const dayOf = (date: string) => Date.parse(`${date}T00:00:00Z`) / 86_400_000;
  const firstDay = dayOf(plan.steps[0]!.date);
  const steps = JSON.stringify(
    plan.steps.map((s, position) => ({
      position,
      day: dayOf(s.date) - firstDay,
      phase: s.phase,
      kind: s.kind,
      title: s.title,
      content: { detail: s.detail, times: s.times, minutesPerCycle: s.minutesPerCycle, why: s.why, cautions: s.cautions },
    })),
  );
  const figures = JSON.stringify({ summary: plan.summary, meta: plan.meta, cautions: plan.cautions });
  const { customers, stepsPerPlan } = benchSize;

  await db.raw(
    `insert into users (company_id, role, name, email)
     select ?, 'customer', 'Bench Homeowner ' || g, 'bench-' || g || '@bench.example' from generate_series(1, ?) g`,
    [companyId, customers],
  );
  await db.raw(
    `insert into customers (company_id, user_id, first_name, last_name, external_ref)
     select ?, u.id, 'Bench', 'Homeowner ' || u.id, 'B-' || u.id from users u where u.email like 'bench-%'`,
    [companyId],
  );
  await db.raw(
    `insert into properties (customer_id, label, street, town, region, postal_code, time_zone, lawn_area_ft2, lawn)
     select c.id, 'Home', c.id || ' Bench Road', 'Wrenmoor', 'OH', '44990', 'America/New_York', 6000, '{}'::jsonb
     from customers c where c.external_ref like 'B-%'`,
  );
  await db.raw(
    `insert into service_visits (property_id, visit_date, services, details, import_key)
     select p.id, current_date - (p.id % 30), '{aeration,overseeding}', '{"areaFt2": 6000}'::jsonb, 'bench:' || p.id
     from properties p join customers c on c.id = p.customer_id where c.external_ref like 'B-%'`,
  );
  await db.raw(
    `insert into care_plans (property_id, visit_id, program_version, input, hold_offs, warnings, figures)
     select v.property_id, v.id, 1, '{}'::jsonb, ?::jsonb, '[]'::jsonb, ?::jsonb
     from service_visits v where v.import_key like 'bench:%'`,
    [JSON.stringify(plan.holdOffs), figures],
  );
  await db.raw(
    `insert into plan_steps (plan_id, key, date, phase, kind, title, content, state)
     select cp.id, 'bench:' || g, v.visit_date + s.day, s.phase, s.kind, s.title, s.content,
            (case when g < 5 then 'done' else 'pending' end)::plan_step_state
     from care_plans cp join service_visits v on v.id = cp.visit_id, generate_series(0, ? - 1) g
     join json_to_recordset(?::json) as s(position int, day int, phase text, kind text, title text, content jsonb) on s.position = g % ?
     where v.import_key like 'bench:%'
     -- As the app writes them: a plan's steps together, so they share table pages.
     order by cp.id, g`,
    [stepsPerPlan, steps, plan.steps.length],
  );
  // Every 10th homeowner has asked a question, so the technician's queue has real depth.
  if (await db.schema.hasTable("messages")) {
    await db.raw(
      `insert into conversations (plan_id)
       select cp.id from care_plans cp join service_visits v on v.id = cp.visit_id
       where v.import_key like 'bench:%' and cp.id % 10 = 0 on conflict do nothing`,
    );
    const hasAuthor = (await db.raw(`select 1 from information_schema.columns where table_name = 'messages' and column_name = 'author_user_id'`)).rowCount > 0;
    if (hasAuthor) {
      await db.raw(
        `insert into messages (conversation_id, kind, author_user_id, text, created_at)
         select cv.id, 'question', c.user_id, 'Is this patch normal?', now() - (cv.id % 72) * interval '1 hour'
         from conversations cv join care_plans cp on cp.id = cv.plan_id
         join properties p on p.id = cp.property_id join customers c on c.id = p.customer_id
         where c.external_ref like 'B-%'`,
      );
      // A third of them already have a staff answer after them but are still open: the queue puts those last.
      await db.raw(
        `insert into messages (conversation_id, kind, author_user_id, text, created_at)
         select q.conversation_id, 'answer', (select id from users where role = 'technician' order by id limit 1), 'Water it a bit longer.', q.created_at + interval '30 minutes'
         from messages q join conversations cv on cv.id = q.conversation_id
         join care_plans cp on cp.id = cv.plan_id join properties p on p.id = cp.property_id join customers c on c.id = p.customer_id
         where q.kind = 'question' and c.external_ref like 'B-%' and cv.id % 3 = 0`,
      );
    }
  }
  // Every homeowner signed in once, so the session read runs against a sessions table of real size.
  await db.raw(
    `insert into sessions (sid, sess, expire)
     select 'bench-' || u.id || '-' || md5(u.id::text),
            json_build_object('cookie', json_build_object('originalMaxAge', 2592000000, 'httpOnly', true, 'path', '/', 'sameSite', 'lax'), 'passport', json_build_object('user', u.id)),
            now() + interval '30 days'
     from users u where u.email like 'bench-%'`,
  );
  // …and every question carries a photo, so the queue's photo look-up has rows to find.
  if (await db.schema.hasTable("photos")) {
    await db.raw(
      `insert into photos (message_id, position, large_key, thumb_key, width, height, bytes, thumb_bytes, sha256)
       select m.id, 0, 'bench/' || m.id || '-large', 'bench/' || m.id || '-thumb', 2048, 1536, 400000, 30000, md5(m.id::text)
       from messages m where m.kind = 'question'`,
    );
  }
  await db.raw("analyze");
}
