import * as cautions from "./cautions.ts";
import * as feedingProgram from "./feeding-program.ts";
import * as feeding from "./feeding.ts";
import * as mowing from "./mowing.ts";
import * as placeRules from "./place-rules.ts";
import * as preEmergent from "./pre-emergent.ts";
import * as seasons from "./seasons.ts";
import * as shade from "./shade.ts";
import * as slopes from "./slopes.ts";
import * as sod from "./sod.ts";
import * as species from "./species.ts";
import * as sprinklers from "./sprinklers.ts";
import * as timing from "./timing.ts";
import * as warmSeason from "./warm-season.ts";
import * as watering from "./watering.ts";
import type { Provenance } from "./provenance.ts";

/*
 * Every sourced value of the engine's tables, gathered by walking the tables'
 * exports: whatever carries a `source` and a `provenance` is an entry. Nothing
 * is copied by hand, so a table edited (or a "from memory" value given its
 * published source) shows up here as it is. A new table module is added to
 * LEDGER_TABLES once; ledger.test.ts fails until it is.
 */
export const LEDGER_TABLES: Readonly<Record<string, Readonly<Record<string, unknown>>>> = {
  cautions,
  "feeding-program": feedingProgram,
  feeding,
  mowing,
  "place-rules": placeRules,
  "pre-emergent": preEmergent,
  seasons,
  shade,
  slopes,
  sod,
  species,
  sprinklers,
  timing,
  "warm-season": warmSeason,
  watering,
};

/** One number, range or setting of an entry: "min" 7, "north.start.month" 9. */
export interface LedgerValue {
  readonly name: string;
  readonly value: number | string | boolean;
}

export interface LedgerEntry {
  /** The table module, e.g. "species". */
  readonly table: string;
  /** Where in the table: "SPECIES_FACTS.tall_fescue.emergenceDays". */
  readonly path: string;
  /** The plain name of what it is about, when the table gives one ("tall fescue", "rotor heads"). */
  readonly about: string | null;
  readonly values: readonly LedgerValue[];
  readonly source: string;
  readonly provenance: Provenance;
}

const PROVENANCES: readonly string[] = ["published", "common practice", "from memory"] satisfies Provenance[];
/** Members that describe an entry rather than being one of its values. */
const NOT_VALUES = new Set(["source", "provenance", "conversionSource", "text", "name", "species", "id"]);
const MAX_DEPTH = 6;

const isRecord = (value: unknown): value is Record<string, unknown> => typeof value === "object" && value !== null;

function isSourced(value: Record<string, unknown>): value is Record<string, unknown> & { source: string; provenance: Provenance } {
  return typeof value.source === "string" && typeof value.provenance === "string" && PROVENANCES.includes(value.provenance);
}

/** Numbers, flags and short settings of an entry, nested plain objects flattened ("north.start.month"); sourced members are entries of their own. */
function valuesOf(record: Record<string, unknown>, prefix: string, out: LedgerValue[], depth: number): void {
  for (const [key, value] of Object.entries(record)) {
    if (!prefix && NOT_VALUES.has(key)) continue;
    const name = prefix ? `${prefix}.${key}` : key;
    if (typeof value === "number" || typeof value === "boolean" || typeof value === "string") out.push({ name, value });
    else if (Array.isArray(value) && value.every((v) => typeof v === "number" || typeof v === "string")) out.push({ name, value: value.join(", ") });
    else if (isRecord(value) && !Array.isArray(value) && !isSourced(value) && depth < MAX_DEPTH) valuesOf(value, name, out, depth + 1);
  }
}

function walk(table: string, path: string, value: unknown, about: string | null, seen: Set<object>, out: LedgerEntry[], depth: number): void {
  if (!isRecord(value) || seen.has(value) || depth > MAX_DEPTH) return;
  seen.add(value);
  const here = typeof value.name === "string" ? value.name : about;
  if (isSourced(value)) {
    const values: LedgerValue[] = [];
    valuesOf(value, "", values, 0);
    out.push({ table, path, about: here, values, source: value.source, provenance: value.provenance });
  }
  for (const [key, child] of Object.entries(value)) walk(table, Array.isArray(value) ? `${path}[${key}]` : `${path}.${key}`, child, here, seen, out, depth + 1);
}

let ledger: readonly LedgerEntry[] | null = null;

/** Every sourced table value with its source and provenance, in table order. Pure; worked out once. */
export function provenanceLedger(): readonly LedgerEntry[] {
  if (ledger) return ledger;
  const out: LedgerEntry[] = [];
  const seen = new Set<object>();
  for (const [table, exports] of Object.entries(LEDGER_TABLES)) {
    for (const [name, value] of Object.entries(exports)) walk(table, name, value, null, seen, out, 0);
  }
  ledger = out;
  return ledger;
}

/** The values still recalled rather than read from a publication: each needs a published source. */
export function valuesNeedingPublishedSource(): readonly LedgerEntry[] {
  return provenanceLedger().filter((entry) => entry.provenance === "from memory");
}
