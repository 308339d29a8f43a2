import type { AppDeps } from "../../app.ts";
import { route, type RouteSpec } from "../../http/route.ts";

export type FailedReminder = {
  id: number;
  planId: number;
  customerId: number;
  customerName: string;
  propertyLabel: string;
  kind: "daily_summary" | "watering_nudge";
  localDate: string;
  localTime: string;
  channel: "sms" | "email";
  attempts: number;
  lastError: string | null;
  failedAt: string;
  /** The same reminder on the other channel, when one was tried. */
  fallback: { channel: "sms" | "email"; state: string } | null;
};

type FailedRow = {
  id: string; plan_id: number; customer_id: number; first_name: string; last_name: string; label: string;
  kind: FailedReminder["kind"]; local_date: string; local_time: string; channel: FailedReminder["channel"];
  attempts: number; last_error: string | null; updated_at: Date; fallback_channel: FailedReminder["channel"] | null; fallback_state: string | null;
};

/** Reminders that could not be delivered, newest first, for staff to follow up (wrong number, bounced address…). */
export function reminderRoutes(deps: AppDeps): RouteSpec[] {
  const { db } = deps;
  return [
    route({
      method: "get",
      path: "/api/reminders/failed",
      access: ["technician", "manager"],
      handler: async ({ user }) => {
        const rows = await db("reminders as r")
          .join("customers as c", "c.id", "r.customer_id")
          .join("care_plans as cp", "cp.id", "r.plan_id")
          .join("properties as p", "p.id", "cp.property_id")
          .leftJoin("reminders as f", "f.fallback_for", "r.id")
          .where({ "c.company_id": user.companyId, "r.state": "failed" })
          .orderBy("r.updated_at", "desc")
          .limit(200)
          .select<FailedRow[]>(
            "r.id", "r.plan_id", "r.customer_id", "c.first_name", "c.last_name", "p.label", "r.kind", "r.local_date", "r.local_time",
            "r.channel", "r.attempts", "r.last_error", "r.updated_at", "f.channel as fallback_channel", "f.state as fallback_state",
          );
        const reminders: FailedReminder[] = rows.map((r) => ({
          id: Number(r.id),
          planId: r.plan_id,
          customerId: r.customer_id,
          customerName: `${r.first_name} ${r.last_name}`,
          propertyLabel: r.label,
          kind: r.kind,
          localDate: r.local_date,
          localTime: r.local_time,
          channel: r.channel,
          attempts: r.attempts,
          lastError: r.last_error,
          failedAt: r.updated_at.toISOString(),
          fallback: r.fallback_channel ? { channel: r.fallback_channel, state: r.fallback_state ?? "scheduled" } : null,
        }));
        return { reminders };
      },
    }),
  ];
}
