import type { Sourced } from "./provenance.ts";
import { SOURCES } from "./sources.ts";
import type { Species } from "./species.ts";

export type ShadeTolerance = "good" | "moderate" | "poor";

const recalled = (rating: ShadeTolerance): Sourced & { readonly rating: ShadeTolerance } => ({
  rating,
  source: "US land-grant extension lawn guides (shade tolerance of turfgrasses)",
  provenance: "from memory",
});

/**
 * How well each grass grows in shade, as the extension lawn guides we recall rank them:
 * fine fescues are the cool-season shade grasses, tall fescue copes with partial shade,
 * Kentucky bluegrass and perennial ryegrass want sun; St. Augustinegrass is the most
 * shade-tolerant warm-season grass, bermudagrass the least. To be checked against a
 * publication.
 */
export const SHADE_TOLERANCE: Readonly<Record<Species, Sourced & { readonly rating: ShadeTolerance }>> = {
  fine_fescue: recalled("good"),
  tall_fescue: recalled("moderate"),
  kentucky_bluegrass: recalled("poor"),
  perennial_ryegrass: recalled("poor"),
  st_augustinegrass: recalled("good"),
  zoysiagrass: recalled("moderate"),
  centipedegrass: recalled("moderate"),
  bahiagrass: recalled("poor"),
  bermudagrass: recalled("poor"),
};

/**
 * A seed mix for shade is mostly shade-tolerant grass. In partial shade "moderate" grasses
 * count; in heavy shade only "good" ones. Shade mixes sold for heavy shade are mostly fine
 * fescue; the half-way line is a rule of thumb.
 */
export const SHADE_MIX_RULE = {
  minTolerantPercent: 50,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

/**
 * Grass in shade grows slowly and needs less nitrogen: about half in heavy shade (common
 * practice); the partial-shade figure sits half-way (Sproutline's choice).
 */
export const SHADE_NITROGEN = {
  factor: { partial: 0.75, heavy: 0.5 },
  source: `${SOURCES.tradePractice}; partial shade: ${SOURCES.sproutlineChoice}`,
  provenance: "common practice",
} as const;
