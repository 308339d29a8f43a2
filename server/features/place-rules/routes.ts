import { placeIdParamsSchema, savePlaceSchema } from "#shared/schemas/place-rules";
import type { Db } from "../../db.ts";
import { auditSubject, route, type RouteSpec } from "../../http/route.ts";
import * as repo from "./repo.ts";
import { createPlace, deletePlace, updatePlace } from "./service.ts";

const staff = ["technician", "manager"] as const;
const managerOnly = ["manager"] as const;

/** Managers keep the rules of the places the company works in; technicians read them. Changes are audited. */
export function placeRuleRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/place-rules",
      access: staff,
      handler: async ({ user }) => ({ places: await repo.listPlaces(db, user.companyId) }),
    }),
    route({
      method: "post",
      path: "/api/place-rules",
      access: managerOnly,
      audit: "place.created",
      body: savePlaceSchema,
      handler: async ({ user, body, res }) => {
        const place = await createPlace(db, user, body);
        auditSubject(res, place.id, { name: place.name });
        res.status(201);
        return { place };
      },
    }),
    route({
      method: "put",
      path: "/api/place-rules/:id",
      access: managerOnly,
      audit: "place.updated",
      params: placeIdParamsSchema,
      body: savePlaceSchema,
      handler: async ({ user, params, body }) => ({ place: await updatePlace(db, user, params.id, body) }),
    }),
    route({
      method: "delete",
      path: "/api/place-rules/:id",
      access: managerOnly,
      audit: "place.deleted",
      params: placeIdParamsSchema,
      handler: async ({ user, params, res }) => {
        auditSubject(res, params.id, { name: await deletePlace(db, user, params.id) });
      },
    }),
  ];
}
