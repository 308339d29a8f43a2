import type { SavePlace } from "#shared/schemas/place-rules";
import type { SessionUser } from "../../auth/session-user.ts";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import * as repo from "./repo.ts";

const duplicateName = (err: unknown) =>
  (err as { code?: string }).code === "23505"
    ? new HttpError(409, "duplicate_name", "A place with this name already exists.", { name: "Pick another name" })
    : err;

/*
 * New plans, and plans regenerated from their visit, take the place's rules as they are then;
 * plans already made keep the rules they were made with (stored in their input).
 */
export async function createPlace(db: Db, user: SessionUser, place: SavePlace) {
  const id = await repo.insertPlace(db, user.companyId, user.id, place).catch((err) => Promise.reject(duplicateName(err)));
  return (await repo.findPlace(db, user.companyId, id))!;
}

export async function updatePlace(db: Db, user: SessionUser, id: number, place: SavePlace) {
  const found = await repo.updatePlace(db, user.companyId, user.id, id, place).catch((err) => Promise.reject(duplicateName(err)));
  if (!found) throw notFound("That place");
  return (await repo.findPlace(db, user.companyId, id))!;
}

/** Returns the name the place had. */
export async function deletePlace(db: Db, user: SessionUser, id: number): Promise<string> {
  const name = await repo.deletePlace(db, user.companyId, id);
  if (name === undefined) throw notFound("That place");
  return name;
}
