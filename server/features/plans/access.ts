import type { Db } from "../../db.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { notFound } from "../../http/errors.ts";

export type PlanAccess = {
  planId: number;
  propertyId: number;
  customerId: number;
  customerUserId: number;
  companyId: number;
  timeZone: string;
};

/** Staff of the plan's company, or the customer who owns the lawn. */
export function maySee(user: SessionUser, plan: { company_id: number; customer_id: number }): boolean {
  return plan.company_id === user.companyId && (user.role !== "customer" || plan.customer_id === user.customerId);
}

/**
 * Finds a plan the signed-in person may see: staff of the same company, or the customer
 * who owns the lawn. Anything else is "not found", so plan ids don't leak.
 */
export async function findPlanForUser(db: Db, user: SessionUser, planId: number): Promise<PlanAccess> {
  const row = await db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where("care_plans.id", planId)
    .andWhere("customers.company_id", user.companyId)
    .first<{ plan_id: number; property_id: number; customer_id: number; user_id: number; company_id: number; time_zone: string } | undefined>(
      "care_plans.id as plan_id",
      "properties.id as property_id",
      "customers.id as customer_id",
      "customers.user_id",
      "customers.company_id",
      "properties.time_zone",
    );
  if (!row || !maySee(user, row)) throw notFound("That care plan");
  return {
    planId: row.plan_id,
    propertyId: row.property_id,
    customerId: row.customer_id,
    customerUserId: row.user_id,
    companyId: row.company_id,
    timeZone: row.time_zone,
  };
}
