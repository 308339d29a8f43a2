// The engine's own modules rather than its index, so the portal's first download doesn't carry the whole engine.
import type { LawnCondition, Service, ShadeLevel, Slope } from "#shared/engine/schemas/plan-input";
import { SPECIES_FACTS, type Species } from "#shared/engine/tables/species";

/** Plain names for the engine's service codes, as staff say them. */
export const SERVICE_LABELS: Record<Service, string> = {
  aeration: "Core aeration",
  dethatching: "Dethatching",
  overseeding: "Overseeding",
  slit_seeding: "Slit seeding",
  new_seeding: "New seeding (bare soil)",
  starter_fertiliser: "Starter fertilizer",
  fertiliser_only: "Fertilizer only",
  top_dressing: "Top dressing",
  sod_installation: "Sod installation",
};

export const LAWN_CONDITION_LABELS: Record<LawnCondition, string> = {
  thin: "Thin or patchy",
  bare: "Bare soil (new lawn)",
  thick: "Thick",
  thick_dormant: "Thick but brown (dormant after summer)",
};
export const SLOPE_LABELS: Record<Slope, string> = { none: "Flat or nearly flat", gentle: "Gentle slope", steep: "Steep slope" };
export const SHADE_LABELS: Record<ShadeLevel, string> = { none: "Full sun", partial: "Partial shade", heavy: "Heavy shade" };

/** A service code from the API as words; unknown codes (a newer server) are shown tidied up. */
export function serviceLabel(service: string): string {
  return SERVICE_LABELS[service as Service] ?? service.replace(/_/g, " ");
}

export function speciesLabel(species: Species): string {
  const name = SPECIES_FACTS[species].name;
  return name.charAt(0).toUpperCase() + name.slice(1);
}
