import type { LedgerEntry, LedgerValue } from "#shared/engine/tables/ledger";

/** Plain names of the engine's tables; a table not listed here shows its own name. */
const TABLE_LABELS: Readonly<Record<string, string>> = {
  cautions: "Cautions",
  feeding: "Feeding",
  mowing: "Mowing",
  species: "Grass species",
  sprinklers: "Sprinklers",
  timing: "Timing",
  watering: "Watering",
};

/** What the last part of an entry's path measures, in plain words. */
const MEASURE_LABELS: Readonly<Record<string, string>> = {
  emergenceDays: "Days from sowing to first sprouts",
  newSeedingLbPer1000: "New-lawn seed rate, lb per 1,000 ft²",
  overseedingLbPer1000: "Overseeding rate, lb per 1,000 ft²",
  rateInPerHour: "Typical watering rate, inches per hour",
  seedsPerLb: "Seeds per pound",
  PRE_EMERGENT_RULE: "Crabgrass preventer before seeding",
  CATCH_CAN_TEST: "Catch-can test of a sprinkler",
};

export function tableLabel(table: string): string {
  return TABLE_LABELS[table] ?? table;
}

/** "Kentucky bluegrass: days from sowing to first sprouts", or the table path when we have no plain name. */
export function entryLabel(entry: LedgerEntry): string {
  const last = entry.path.split(".").at(-1) ?? entry.path;
  const measure = MEASURE_LABELS[last];
  if (!measure) return entry.about ? `${entry.about}: ${last}` : entry.path;
  return entry.about ? `${capitalise(entry.about)}: ${measure.charAt(0).toLowerCase()}${measure.slice(1)}` : measure;
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "7–14" for a range, else "cans: 6 to 8 · minutes: 15"; "—" when the entry is a rule without numbers. */
export function valuesText(values: readonly LedgerValue[]): string {
  const min = values.find((v) => v.name === "min");
  const max = values.find((v) => v.name === "max");
  const rest = values.filter((v) => v !== min && v !== max);
  const parts = min && max ? [`${String(min.value)}–${String(max.value)}`] : [];
  for (const v of min && max ? rest : values) parts.push(`${v.name}: ${String(v.value)}`);
  return parts.length > 0 ? parts.join(" · ") : "—";
}

/** Entries grouped by table, tables in ledger order. */
export function byTable(entries: readonly LedgerEntry[]): { table: string; entries: LedgerEntry[] }[] {
  const groups = new Map<string, LedgerEntry[]>();
  for (const entry of entries) {
    const group = groups.get(entry.table);
    if (group) group.push(entry);
    else groups.set(entry.table, [entry]);
  }
  return [...groups].map(([table, list]) => ({ table, entries: list }));
}
