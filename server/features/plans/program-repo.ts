import { defaultProgramSettings, programSettingsSchema, type ProgramSettings } from "#shared/engine/index";
import type { Db } from "../../db.ts";

/**
 * The company's newest care-program settings. Plans record the version they were made
 * from and keep it; a new version only affects plans made (or regenerated) afterwards.
 */
export async function currentProgram(db: Db, companyId: number): Promise<ProgramSettings> {
  const row = await db("program_settings")
    .where({ company_id: companyId })
    .orderBy("version", "desc")
    .first<{ version: number; settings: unknown } | undefined>("version", "settings");
  if (!row) return { ...defaultProgramSettings, version: 1 };
  return programSettingsSchema.parse({ ...(row.settings as object), version: row.version });
}

export async function programVersion(db: Db, companyId: number, version: number): Promise<ProgramSettings | undefined> {
  const row = await db("program_settings").where({ company_id: companyId, version }).first<{ settings: unknown } | undefined>("settings");
  return row ? programSettingsSchema.parse({ ...(row.settings as object), version }) : undefined;
}
