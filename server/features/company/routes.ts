import type { Db } from "../../db.ts";
import { notFound } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";

/**
 * The company this deployment serves, by name only: the staff sign-in page shows it before
 * anyone is signed in. One company per deployment for now; the oldest one is it.
 */
export function companyRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/company",
      access: "public",
      handler: async () => {
        const company = await db("companies").orderBy("id").first<{ name: string }>("name");
        if (!company) throw notFound("The company");
        return { company: { name: company.name } };
      },
    }),
  ];
}
