/**
 * Test data for reminder tests: customers of the demo company with a plan whose steps we choose,
 * in a zone we choose, and helpers to run the dispatcher against the in-process fakes.
 */
import { randomInt } from "node:crypto";
import type { Db } from "../../../db.ts";
import type { Config } from "../../../config.ts";
import { createMessenger } from "../../../messaging/create-messenger.ts";
import { ReminderDispatcher } from "../dispatcher.ts";
import { loadReminderSettings, type ReminderSettings } from "../settings.ts";
import { createSmsLookup } from "../sms-lookup.ts";

/** A fixed-offset IANA zone where it is early afternoon right now, so quiet hours never get in a test's way. */
export function daytimeZone(now = new Date()): string {
  let offset = 13 - now.getUTCHours();
  if (offset > 14) offset -= 24;
  if (offset < -12) offset += 24;
  return offset === 0 ? "Etc/UTC" : offset > 0 ? `Etc/GMT-${offset}` : `Etc/GMT+${-offset}`;
}

/** …and one where it is the middle of the night. */
export function nighttimeZone(now = new Date()): string {
  let offset = 2 - now.getUTCHours();
  if (offset > 14) offset -= 24;
  if (offset < -12) offset += 24;
  return offset === 0 ? "Etc/UTC" : offset > 0 ? `Etc/GMT-${offset}` : `Etc/GMT+${-offset}`;
}

// The exchange (the counter's first three digits) must start with 2–9 to be a valid NANP number.
let phoneCounter = randomInt(2_000_000, 8_000_000);
/** Unused E.164 numbers in a range the seed does not use; never ending 0000 or 1111 (the fake's special numbers). */
export function freshPhone(): string {
  do phoneCounter += 1;
  while (String(phoneCounter).endsWith("0000") || String(phoneCounter).endsWith("1111"));
  return `+1331${phoneCounter}`;
}

export type FixtureStep = {
  date: string;
  kind?: string;
  title?: string;
  times?: string[];
  minutesPerCycle?: number;
  cycleAndSoak?: { runsPerCycle: number; soakMinutes: number; minutesBefore: number; cycleStarts: string[] };
  state?: "pending" | "done" | "skipped";
};

export type FixtureCustomer = { customerId: number; userId: number; planId: number; propertyId: number; phone: string | null; email: string | null };

export async function createCustomerWithPlan(
  db: Db,
  options: { timeZone: string; steps: FixtureStep[]; phone?: string | null; email?: string | null; name?: string },
): Promise<FixtureCustomer> {
  const company = await db("companies").where({ slug: "cobblefield" }).first<{ id: number }>("id");
  const phone = options.phone === undefined ? freshPhone() : options.phone;
  const email = options.email === undefined ? `rem-${randomInt(1e9)}@test.example` : options.email;
  const [user] = await db("users").insert({ company_id: company.id, role: "customer", name: options.name ?? "Robin Tester", email, phone }).returning<{ id: number }[]>("id");
  const [customer] = await db("customers").insert({ company_id: company.id, user_id: user!.id, first_name: "Robin", last_name: "Tester" }).returning<{ id: number }[]>("id");
  const [property] = await db("properties")
    .insert({ customer_id: customer!.id, street: "1 Test Lane", town: "Wrenmoor", region: "OH", postal_code: "44990", time_zone: options.timeZone })
    .returning<{ id: number }[]>("id");
  const [visit] = await db("service_visits")
    .insert({ property_id: property!.id, visit_date: options.steps[0]?.date ?? "2026-12-01", services: ["overseeding"], details: JSON.stringify({ areaFt2: 1000 }) })
    .returning<{ id: number }[]>("id");
  const [plan] = await db("care_plans").insert({ property_id: property!.id, visit_id: visit!.id, program_version: 1, input: "{}" }).returning<{ id: number }[]>("id");
  await addSteps(db, plan!.id, options.steps);
  return { customerId: customer!.id, userId: user!.id, planId: plan!.id, propertyId: property!.id, phone, email };
}

let stepCounter = 0;
export async function addSteps(db: Db, planId: number, steps: FixtureStep[]) {
  if (steps.length === 0) return;
  await db("plan_steps").insert(
    steps.map((s) => ({
      plan_id: planId,
      key: `fixture:${s.date}:${s.kind ?? "water"}:${(stepCounter += 1)}`,
      date: s.date,
      phase: "germination",
      kind: s.kind ?? "water",
      title: s.title ?? (s.kind === "mow" ? "Mow to 3.5 in" : "Water the seeded areas lightly"),
      content: JSON.stringify({ detail: "Keep the seed damp.", times: s.times ?? (s.kind && s.kind !== "water" ? undefined : ["09:00", "13:00"]), minutesPerCycle: s.minutesPerCycle ?? 6, cycleAndSoak: s.cycleAndSoak, why: { text: "", source: "", provenance: "common practice" }, cautions: [] }),
      state: s.state ?? "pending",
    })),
  );
}

/** A daily summary row due now (as if scheduled earlier), for worker tests. */
export async function insertDueReminder(db: Db, c: FixtureCustomer, options: { localDate: string; timeZone: string; channel?: "sms" | "email"; kind?: "daily_summary" | "watering_nudge"; localTime?: string }) {
  const [row] = await db("reminders")
    .insert({
      customer_id: c.customerId,
      plan_id: c.planId,
      kind: options.kind ?? "daily_summary",
      local_date: options.localDate,
      local_time: options.localTime ?? "08:00",
      time_zone: options.timeZone,
      channel: options.channel ?? "sms",
      due_at: db.fn.now(),
      next_attempt_at: db.fn.now(),
    })
    .returning<{ id: string }[]>("id");
  return Number(row!.id);
}

export const fastSettings = (overrides: Partial<Record<keyof ReminderSettings, string>> = {}): ReminderSettings =>
  loadReminderSettings({
    REMINDER_POLL_MS: "50",
    REMINDER_CONCURRENCY: "20",
    REMINDER_LEASE_SECONDS: "30",
    REMINDER_RETRY_BASE_MS: "20",
    REMINDER_RETRY_MAX_MS: "400",
    REMINDER_MAX_ATTEMPTS: "40",
    REMINDER_IN_DOUBT_SETTLE_MS: "500",
    REMINDER_SMS_TIMEOUT_MS: "5000",
    REMINDER_STATUS_CALLBACKS: "false",
    ...overrides,
  });

export function testDispatcher(db: Db, config: Config, settings = fastSettings(), log: (m: string, e?: unknown) => void = () => {}) {
  return new ReminderDispatcher({ db, config, messenger: createMessenger(config), lookup: createSmsLookup(config), settings, log });
}

/** Polls until `check` is true (for the worker running in the background). */
export async function eventually(check: () => Promise<boolean>, timeoutMs: number, what: string) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`timed out waiting for ${what}`);
}

export async function stateCounts(db: Db, ids: number[]): Promise<Record<string, number>> {
  const rows = await db("reminders").whereIn("id", ids).groupBy("state").select<{ state: string; count: string }[]>("state", db.raw("count(*)::int as count"));
  return Object.fromEntries(rows.map((r) => [r.state, Number(r.count)]));
}

/** `customers` customers × `days` plan days, one due daily-summary text each: customers × days reminders in all. */
export async function manyDueReminders(db: Db, customers: number, days: number, zone: string, today: string): Promise<{ ids: number[]; phones: string[] }> {
  const ids: number[] = [];
  const phones: string[] = [];
  for (let i = 0; i < customers; i++) {
    const dates = Array.from({ length: days }, (_, d) => addDaysIso(today, d - Math.floor(days / 2)));
    const c = await createCustomerWithPlan(db, { timeZone: zone, steps: dates.map((date) => ({ date, kind: "mow" })), email: null });
    phones.push(c.phone!);
    const rows = await db("reminders")
      .insert(dates.map((date) => ({ customer_id: c.customerId, plan_id: c.planId, kind: "daily_summary", local_date: date, local_time: "08:00", time_zone: zone, channel: "sms", due_at: db.fn.now(), next_attempt_at: db.fn.now() })))
      .returning<{ id: string }[]>("id");
    ids.push(...rows.map((r) => Number(r.id)));
  }
  return { ids, phones };
}

/**
 * `customers` customers with both a mobile number and an e-mail address × `days` plan days, one due
 * daily summary per day on each channel: customers × days × 2 reminders in all.
 */
export async function manyDueRemindersOnBothChannels(
  db: Db,
  customers: number,
  days: number,
  zone: string,
  today: string,
): Promise<{ smsIds: number[]; emailIds: number[]; customerIds: number[]; phones: string[]; emails: string[] }> {
  const out = { smsIds: [] as number[], emailIds: [] as number[], customerIds: [] as number[], phones: [] as string[], emails: [] as string[] };
  for (let i = 0; i < customers; i++) {
    const dates = Array.from({ length: days }, (_, d) => addDaysIso(today, d - Math.floor(days / 2)));
    const c = await createCustomerWithPlan(db, { timeZone: zone, steps: dates.map((date) => ({ date, kind: "mow" })) });
    out.customerIds.push(c.customerId);
    out.phones.push(c.phone!);
    out.emails.push(c.email!);
    for (const channel of ["sms", "email"] as const) {
      const rows = await db("reminders")
        .insert(dates.map((date) => ({ customer_id: c.customerId, plan_id: c.planId, kind: "daily_summary", local_date: date, local_time: "08:00", time_zone: zone, channel, due_at: db.fn.now(), next_attempt_at: db.fn.now() })))
        .returning<{ id: string }[]>("id");
      (channel === "sms" ? out.smsIds : out.emailIds).push(...rows.map((r) => Number(r.id)));
    }
  }
  return out;
}

function addDaysIso(date: string, days: number): string {
  const d = new Date(`${date}T00:00:00Z`);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/** Every (number, text) pair at the fake exactly once, and nothing else to those numbers. */
export function sendsPerText(messages: { to: string; body: string; direction: string }[], phones: string[]): Map<string, number> {
  const wanted = new Set(phones);
  const counts = new Map<string, number>();
  for (const m of messages) {
    if (m.direction !== "outbound-api" || !wanted.has(m.to)) continue;
    const key = `${m.to}|${m.body}`;
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  return counts;
}

/** E-mails received at the SMTP fake per (envelope recipient, Message-ID), for recipients in `emails` only. */
export function receivedPerMessage(messages: { envelopeTo: string[]; messageId: string | null }[], emails: string[]): Map<string, number> {
  const wanted = new Set(emails);
  const counts = new Map<string, number>();
  for (const m of messages) {
    for (const to of m.envelopeTo) {
      if (!wanted.has(to)) continue;
      const key = `${to}|${m.messageId}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
  }
  return counts;
}
