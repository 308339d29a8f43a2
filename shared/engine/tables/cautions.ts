import type { Provenance } from "./provenance.ts";

/*
 * Texts the product must show ("Cautions the product must show",
 * TRADE-REFERENCES.md). Worded in our own plain language.
 */
export const CAUTION_IDS = [
  "label_is_law",
  "children_pets",
  "phosphorus_rules",
  "watering_restrictions",
  "equipment_safety",
  "licensed_applicator",
  "local_ordinances",
] as const;
export type CautionId = (typeof CAUTION_IDS)[number];

export interface Caution {
  readonly id: CautionId;
  readonly text: string;
  readonly source: string;
  readonly provenance: Provenance;
}

const tradeCaution = (id: CautionId, text: string): Caution => ({
  id,
  text,
  source: "Sproutline trade references: cautions the product must show",
  provenance: "common practice",
});

export const CAUTIONS: Readonly<Record<CautionId, Caution>> = {
  label_is_law: tradeCaution(
    "label_is_law",
    "Read the product label and do what it says. For fertilizer and weed control, the label is the law.",
  ),
  children_pets: tradeCaution(
    "children_pets",
    "Keep children and pets off the treated lawn for as long as the label says.",
  ),
  phosphorus_rules: tradeCaution(
    "phosphorus_rules",
    "Your town or state may limit phosphorus, spreading near water, or the dates you can feed. Check before you spread.",
  ),
  watering_restrictions: tradeCaution(
    "watering_restrictions",
    "Follow any local watering restrictions or drought orders, even if this plan says to water.",
  ),
  equipment_safety: tradeCaution(
    "equipment_safety",
    "Mowers, aerators and dethatchers can cause injury. Follow the maker's instructions.",
  ),
  licensed_applicator: tradeCaution(
    "licensed_applicator",
    "Where local rules require it, regulated products are applied and recorded by a licensed applicator.",
  ),
  local_ordinances: tradeCaution(
    "local_ordinances",
    "Your state, county, town and water utility set the rules for feeding and watering. This plan follows the rules your lawn-care company entered; where the local rules say otherwise, they win.",
  ),
};
