import { idParamSchema } from "#shared/schemas/properties";
import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import * as repo from "./repo.ts";
import { placeOfProperty } from "../place-rules/repo.ts";

/** A customer sees only their own lawns; anything else is "not found", never "forbidden", so ids don't leak. */
export function canSeeProperty(user: SessionUser, property: { customerId: number }): boolean {
  return user.role !== "customer" || property.customerId === user.customerId;
}

export function propertyRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/my/properties",
      access: ["customer"],
      handler: async ({ user }) => ({ properties: await repo.listForCustomer(db, user.companyId, user.customerId ?? -1) }),
    }),
    route({
      method: "get",
      path: "/api/properties/:id",
      access: ["customer", "technician", "manager"],
      audit: "property.read",
      params: idParamSchema,
      handler: async ({ user, params }) => {
        const property = await repo.findInCompany(db, user.companyId, params.id);
        if (!property || !canSeeProperty(user, property)) throw notFound("That property");
        if (user.role === "customer") return { property };
        // Staff log visits against the lawn: its place's rules let the form warn as the saved plan will.
        const placeRules = (await placeOfProperty(db, user.companyId, property.region, property.postalCode)) ?? null;
        return { property: { ...property, placeRules } };
      },
    }),
  ];
}
