import type { PlaceRules } from "#shared/engine/index";
import type { Place, SavePlace } from "#shared/schemas/place-rules";
import type { Db } from "../../db.ts";

type StoredRules = Pick<PlaceRules, "fertilizerBlackouts" | "phosphorus" | "watering">;

type Row = {
  id: number; name: string; region: string; zip_prefixes: string[]; rules: StoredRules; is_example: boolean; updated_at: Date;
};

const COLUMNS = ["id", "name", "region", "zip_prefixes", "rules", "is_example", "updated_at"] as const;

const toPlace = (r: Row): Place => ({
  id: r.id,
  name: r.name,
  region: r.region,
  zipPrefixes: r.zip_prefixes,
  fertilizerBlackouts: r.rules.fertilizerBlackouts ?? [],
  phosphorus: r.rules.phosphorus ?? "allowed",
  watering: r.rules.watering ?? null,
  isExample: r.is_example,
  updatedAt: r.updated_at.toISOString(),
});

function columnsOf(place: SavePlace) {
  const rules: StoredRules = {
    fertilizerBlackouts: place.fertilizerBlackouts,
    phosphorus: place.phosphorus,
    ...(place.watering ? { watering: place.watering } : {}),
  };
  return { name: place.name, region: place.region, zip_prefixes: place.zipPrefixes, rules: JSON.stringify(rules), is_example: place.isExample };
}

export async function listPlaces(db: Db, companyId: number): Promise<Place[]> {
  const rows = await db("place_rules").where({ company_id: companyId }).orderBy([{ column: "region" }, { column: "name" }]).select<Row[]>(...COLUMNS);
  return rows.map(toPlace);
}

export async function findPlace(db: Db, companyId: number, id: number): Promise<Place | undefined> {
  const row = await db("place_rules").where({ company_id: companyId, id }).first<Row | undefined>(...COLUMNS);
  return row ? toPlace(row) : undefined;
}

export async function insertPlace(db: Db, companyId: number, userId: number, place: SavePlace): Promise<number> {
  const [row] = await db("place_rules").insert({ company_id: companyId, updated_by: userId, ...columnsOf(place) }).returning<{ id: number }[]>("id");
  return row!.id;
}

export async function updatePlace(db: Db, companyId: number, userId: number, id: number, place: SavePlace): Promise<boolean> {
  const count = await db("place_rules").where({ company_id: companyId, id }).update({ ...columnsOf(place), updated_by: userId, updated_at: db.fn.now() });
  return count > 0;
}

/** The deleted place's name (for the audit log, which outlives it), or undefined when there was none. */
export async function deletePlace(db: Db, companyId: number, id: number): Promise<string | undefined> {
  const rows = await db("place_rules").where({ company_id: companyId, id }).delete().returning<{ name: string }[]>("name");
  return rows[0]?.name;
}

/**
 * The place a property is in: among the company's places of its state, the one whose ZIP prefix
 * matches the postal code longest; a place without prefixes covers the rest of the state. One query.
 */
export async function placeOfProperty(db: Db, companyId: number, region: string, postalCode: string): Promise<PlaceRules | undefined> {
  const row = await db("place_rules")
    .where({ company_id: companyId })
    .whereRaw("upper(region) = upper(?)", [region.trim()])
    .select<(Pick<Row, "name" | "rules"> & { best: number })[]>(
      "name",
      "rules",
      db.raw(
        "coalesce((select max(length(p)) from unnest(zip_prefixes) p where ? like p || '%'), case when cardinality(zip_prefixes) = 0 then 0 else -1 end) as best",
        [postalCode.trim()],
      ),
    )
    .orderBy([{ column: "best", order: "desc" }, { column: "id" }])
    .first();
  if (!row || row.best < 0) return undefined;
  return { name: row.name, ...row.rules, fertilizerBlackouts: row.rules.fertilizerBlackouts ?? [], phosphorus: row.rules.phosphorus ?? "allowed" };
}
