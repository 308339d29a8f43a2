// The engine's own modules rather than its index, so the portal's first download doesn't carry the whole engine.
import type { Service } from "#shared/engine/schemas/plan-input";
import { SPECIES_FACTS, type Species } from "#shared/engine/tables/species";

/** Plain names for the engine's service codes, as staff say them. */
export const SERVICE_LABELS: Record<Service, string> = {
  aeration: "Core aeration",
  dethatching: "Dethatching",
  overseeding: "Overseeding",
  slit_seeding: "Slit seeding",
  new_seeding: "New seeding (bare soil)",
  starter_fertiliser: "Starter fertiliser",
  fertiliser_only: "Fertilizer only",
  top_dressing: "Top dressing",
  sod_installation: "Sod installation",
};

/** A service code from the API as words; unknown codes (a newer server) are shown tidied up. */
export function serviceLabel(service: string): string {
  return SERVICE_LABELS[service as Service] ?? service.replace(/_/g, " ");
}

export function speciesLabel(species: Species): string {
  const name = SPECIES_FACTS[species].name;
  return name.charAt(0).toUpperCase() + name.slice(1);
}
