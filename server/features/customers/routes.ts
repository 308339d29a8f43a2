import { customerSearchQuerySchema, type CustomerDetail } from "#shared/schemas/customers";
import { idParamSchema } from "#shared/schemas/properties";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import { followUpsOfCustomer } from "../follow-ups/repo.ts";
import { plansOfCustomer } from "../plans/plans-repo.ts";
import { listForCustomer } from "../properties/repo.ts";
import { conversationsOfCustomer, findCustomer, remindersOfCustomer, searchCustomers, visitsOfCustomer } from "./repo.ts";

const staff = ["technician", "manager"] as const;

export function customerRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/customers",
      access: staff,
      query: customerSearchQuerySchema,
      handler: async ({ user, query }) => ({ customers: await searchCustomers(db, user.companyId, query.q, query.limit) }),
    }),
    route({
      method: "get",
      path: "/api/customers/:id",
      access: staff,
      audit: "customer.read",
      params: idParamSchema,
      handler: async ({ user, params }): Promise<CustomerDetail> => {
        const customer = await findCustomer(db, user.companyId, params.id);
        if (!customer) throw notFound("That customer");
        const [properties, plans, visits, followUps, conversations, reminders] = await Promise.all([
          listForCustomer(db, user.companyId, customer.id),
          plansOfCustomer(db, customer.id),
          visitsOfCustomer(db, customer.id),
          followUpsOfCustomer(db, user.companyId, customer.id),
          conversationsOfCustomer(db, customer.id),
          remindersOfCustomer(db, customer.id),
        ]);
        return { customer, properties, plans, visits, followUps, conversations, reminders };
      },
    }),
  ];
}
