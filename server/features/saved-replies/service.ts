import { z } from "zod";
import { speciesSchema, type Species } from "#shared/engine/index";
import { fillPlaceholders, speciesNotInLawn, type SavedReplyInput, type SavedReplyPlaceholder } from "#shared/schemas/saved-replies";
import type { SessionUser } from "../../auth/session-user.ts";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { findPlanForUser } from "../plans/access.ts";
import * as repo from "./repo.ts";

const weekdays = ["Sunday", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"];
const months = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"];

/** "Tuesday, September 8": a plan date as a homeowner reads it, the same on every server locale. */
export function spokenDate(isoDate: string): string {
  const [y, m, d] = isoDate.split("-").map(Number) as [number, number, number];
  const weekday = new Date(Date.UTC(y, m - 1, d)).getUTCDay();
  return `${weekdays[weekday]}, ${months[m - 1]} ${d}`;
}

/** Read where a date is not known yet (e.g. a plan without a mowing step). */
export const NO_DATE_YET = "(date to be confirmed)";

const duplicateTitle = (err: unknown) =>
  (err as { code?: string }).code === "23505"
    ? new HttpError(409, "duplicate_title", "A saved reply with this title already exists.", { title: "Pick another title" })
    : err;

export async function createReply(db: Db, user: SessionUser, input: SavedReplyInput) {
  const id = await repo.insertReply(db, { companyId: user.companyId, ...input, createdBy: user.id }).catch((err) => Promise.reject(duplicateTitle(err)));
  return (await repo.findReply(db, user.companyId, id))!;
}

export async function updateReply(db: Db, user: SessionUser, id: number, input: SavedReplyInput) {
  const found = await repo.updateReply(db, user.companyId, id, input).catch((err) => Promise.reject(duplicateTitle(err)));
  if (!found) throw notFound("That saved reply");
  return (await repo.findReply(db, user.companyId, id))!;
}

/*
 * The lawn's stored facts are checked by the engine's parser only when a plan is made; read just
 * the grass names here and skip anything unexpected rather than fail the reply.
 */
const storedGrassSchema = z.object({ species: z.array(z.unknown()).catch([]), season: z.enum(["cool", "warm"]).optional().catch(undefined) }).catch({ species: [] });
const storedSeedMixSchema = z.array(z.object({ species: z.unknown() }).catch({ species: null })).catch([]);

function lawnGrasses(grassType: unknown, seedMix: unknown): { species: Species[]; season?: "cool" | "warm" } {
  const grass = storedGrassSchema.parse(grassType ?? {});
  const named = [...grass.species, ...storedSeedMixSchema.parse(seedMix ?? []).map((e) => e.species)];
  const species = [...new Set(named.flatMap((s) => (speciesSchema.safeParse(s).success ? [s as Species] : [])))];
  return grass.season ? { species, season: grass.season } : { species };
}

/** The reply's text for one customer's plan; a reply or plan of another company is "not found". */
export async function renderReply(
  db: Db,
  user: SessionUser,
  replyId: number,
  planId: number,
): Promise<{ text: string; missing: SavedReplyPlaceholder[]; speciesNotInLawn: Species[] }> {
  const reply = await repo.findReply(db, user.companyId, replyId);
  if (!reply) throw notFound("That saved reply");
  await findPlanForUser(db, user, planId);
  const facts = (await repo.planFacts(db, planId))!;
  const missing: SavedReplyPlaceholder[] = facts.first_mow_date ? [] : ["firstMowDate"];
  const text = fillPlaceholders(reply.body, {
    firstName: facts.first_name,
    visitDate: spokenDate(facts.visit_date),
    firstMowDate: facts.first_mow_date ? spokenDate(facts.first_mow_date) : NO_DATE_YET,
    companyName: facts.company_name,
  });
  return { text, missing, speciesNotInLawn: speciesNotInLawn(reply.body, lawnGrasses(facts.grass_type, facts.seed_mix)) };
}
