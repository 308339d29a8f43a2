import { readdirSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { LEDGER_TABLES, provenanceLedger, valuesNeedingPublishedSource } from "./ledger.ts";
import { SOURCES } from "./sources.ts";
import { SPECIES } from "./species.ts";
import { SPRINKLER_TYPES } from "./sprinklers.ts";

const entryAt = (path: string) => provenanceLedger().find((e) => e.path === path);

describe("provenance ledger of the engine's tables", () => {
  it("lists a recalled value with its numbers, source and plain name: Kentucky bluegrass emerges in 14–30 days (land-grant establishment guides, from memory)", () => {
    expect(entryAt("SPECIES_FACTS.kentucky_bluegrass.emergenceDays")).toEqual({
      table: "species",
      path: "SPECIES_FACTS.kentucky_bluegrass.emergenceDays",
      about: "Kentucky bluegrass",
      values: [
        { name: "min", value: 14 },
        { name: "max", value: 30 },
      ],
      source: SOURCES.landGrantEstablishment,
      provenance: "from memory",
    });
  });

  it("keeps published values in the ledger but off the needs-a-source list: tall fescue new seeding 6–8 lb (Cornell 'Seeding rates'; Nebraska Extension 2021)", () => {
    const path = "SPECIES_FACTS.tall_fescue.newSeedingLbPer1000";
    expect(entryAt(path)).toMatchObject({ provenance: "published", values: [{ name: "min", value: 6 }, { name: "max", value: 8 }] });
    expect(valuesNeedingPublishedSource().map((e) => e.path)).not.toContain(path);
  });

  it("flattens a rule's nested settings: leaf season starts September 1 in the north (common practice)", () => {
    expect(entryAt("LEAF_SEASON")?.values).toContainEqual({ name: "north.start.month", value: 9 });
    expect(entryAt("LEAF_SEASON")?.provenance).toBe("common practice");
  });

  it("needs a published source for exactly the entries marked from memory, every sprinkler default and every species' emergence among them", () => {
    const needing = valuesNeedingPublishedSource();
    expect(needing.length).toBeGreaterThan(0);
    expect(needing.every((e) => e.provenance === "from memory")).toBe(true);
    expect(provenanceLedger().filter((e) => e.provenance === "from memory")).toEqual(needing);
    const paths = needing.map((e) => e.path);
    // Sprinkler rates are recalled from the IFAS and Texas A&M irrigation guides (tables/sprinklers.ts).
    for (const type of SPRINKLER_TYPES) expect(paths).toContain(`SPRINKLER_DEFAULTS.${type}.rateInPerHour`);
    // Emergence days of every species are recalled from establishment guides (tables/species.ts).
    for (const s of SPECIES) expect(paths).toContain(`SPECIES_FACTS.${s}.emergenceDays`);
    expect(paths).toContain("PRE_EMERGENT_RULE");
    expect(paths).toContain("CATCH_CAN_TEST");
  });

  it("lists each table value once, every entry with a source", () => {
    const paths = provenanceLedger().map((e) => `${e.table}:${e.path}`);
    expect(new Set(paths).size).toBe(paths.length);
    expect(provenanceLedger().every((e) => e.source.trim().length > 0)).toBe(true);
  });

  it("reads every table module, so a new table cannot be left out", () => {
    const modules = readdirSync(new URL(".", import.meta.url))
      .filter((f) => f.endsWith(".ts") && !f.endsWith(".test.ts"))
      .map((f) => f.replace(/\.ts$/, ""))
      // provenance.ts holds types, sources.ts names publications, ledger.ts is this list.
      .filter((name) => !["provenance", "sources", "ledger"].includes(name));
    expect(Object.keys(LEDGER_TABLES).sort()).toEqual(modules.sort());
  });
});
