import { programSettingsSchema } from "#shared/engine/index";
import { saveProgramSchema } from "#shared/schemas/programs";
import type { Db } from "../../db.ts";
import { HttpError, fieldErrors } from "../../http/errors.ts";
import { route, type RouteSpec } from "../../http/route.ts";

/**
 * A manager saves the care program as a new version. Existing plans keep the version they
 * were made from; new and regenerated-from-visit plans use the newest.
 */
export function programRoutes(db: Db): RouteSpec[] {
  return [
    route({
      method: "post",
      path: "/api/programs",
      access: ["manager"],
      audit: "program.saved",
      body: saveProgramSchema,
      handler: async ({ user, body, res }) => {
        const { version: _ignored, ...submitted } = body.settings;
        const parsed = programSettingsSchema.safeParse(submitted);
        if (!parsed.success) {
          throw new HttpError(400, "invalid_input", "Some settings are outside their safe bounds.", fieldErrors(parsed.error, "settings"));
        }
        const { version: _default, ...settings } = parsed.data;
        const saved = await db.transaction(async (trx) => {
          // Serialises two managers saving at once: each gets the next number in turn.
          await trx("companies").where({ id: user.companyId }).forUpdate().first("id");
          const latest = await trx("program_settings").where({ company_id: user.companyId }).max<{ max: number | null }[]>("version as max");
          const current = latest[0]?.max ?? 0;
          if (body.basedOnVersion !== undefined && body.basedOnVersion !== current) {
            throw new HttpError(409, "version_conflict", `Version ${current} was saved after you started editing. Reload to see it, then make your changes again.`);
          }
          const version = current + 1;
          await trx("program_settings").insert({ company_id: user.companyId, version, settings: JSON.stringify(settings), created_by: user.id });
          return { version, settings: { ...settings, version } };
        });
        res.status(201).json(saved);
      },
    }),
  ];
}
