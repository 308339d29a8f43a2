import type { PlanContext } from "../context.ts";
import { formatNumber } from "../format.ts";
import type { SeedMixEntry, ShadeLevel } from "../schemas/plan-input.ts";
import { oneOffKey } from "../step-keys.ts";
import { firstPlanDay } from "./plan-start.ts";
import type { Provenance } from "../tables/provenance.ts";
import { SHADE_MIX_RULE, SHADE_NITROGEN, SHADE_TOLERANCE, type ShadeTolerance } from "../tables/shade.ts";
import { SPECIES, SPECIES_FACTS } from "../tables/species.ts";
import type { PlanStep, WarningFinding } from "../types.ts";

const TEXT = {
  mixMessage: (shade: Exclude<ShadeLevel, "none">, percent: string, names: string, coolSeason: boolean) =>
    `${shade === "heavy" ? "Heavy" : "Partial"} shade, but only ${percent} % of the mix is shade-tolerant grass (${names}).` +
    (coolSeason ? ` Shade mixes are mostly fine fescues${shade === "partial" ? " (tall fescue copes with partial shade)" : ""}.` : ""),
  mixReason: "Sun-loving grasses sown in shade come up, then thin out within a season or two.",
  nitrogen: (n: string, total: string, area: string) =>
    ` Your lawn is shaded, so use less: about ${n} lb of nitrogen per 1,000 ft² (${total} lb for your ${area} ft²).`,
  nitrogenWhy: " Grass in shade grows slowly and uses less nitrogen; more only makes soft, disease-prone growth.",
  careTitle: "Looking after grass in the shade",
  careDetail:
    "Shaded grass grows more slowly than grass in sun. Rake or blow fallen leaves off it promptly, keep foot traffic light, and if you can, trim low branches to let in more light. Any feeding in this plan already uses less fertilizer because of the shade.",
  careWhy: "Grass in shade gets less light to make food, so it recovers slowly from wear and needs less feeding.",
} as const;

export function shadeOf(ctx: PlanContext): ShadeLevel {
  return ctx.input.property.shade ?? "none";
}

/** Which ratings count as shade-tolerant at this level of shade. */
function tolerantAt(shade: Exclude<ShadeLevel, "none">, rating: ShadeTolerance): boolean {
  return rating === "good" || (shade === "partial" && rating === "moderate");
}

/** Percent of the mix (by weight, as the tag lists it) that tolerates this shade. */
export function shadeTolerantPercent(mix: readonly SeedMixEntry[], shade: Exclude<ShadeLevel, "none">): number {
  let total = 0;
  let tolerant = 0;
  for (const entry of mix) {
    total += entry.percent;
    if (tolerantAt(shade, SHADE_TOLERANCE[entry.species].rating)) tolerant += entry.percent;
  }
  return total > 0 ? (tolerant * 100) / total : 0;
}

/** A crew warning when seed sown on a shaded lawn is mostly sun grass. */
export function shadeWarnings(ctx: PlanContext): WarningFinding[] {
  const shade = shadeOf(ctx);
  const mix = ctx.input.visit.seedMix;
  if (shade === "none" || !ctx.seeding || mix.length === 0) return [];
  const percent = shadeTolerantPercent(mix, shade);
  if (percent >= SHADE_MIX_RULE.minTolerantPercent - 1e-9) return [];
  const ratingsProvenance: Provenance = mix.some((e) => SHADE_TOLERANCE[e.species].provenance === "from memory") ? "from memory" : "common practice";
  // Name the tolerant grasses of the mix's own season(s): a cool-season lawn is not told about St. Augustinegrass.
  const seasons = new Set(mix.map((e) => SPECIES_FACTS[e.species].season));
  const tolerantNames = SPECIES.filter((s) => seasons.has(SPECIES_FACTS[s].season) && tolerantAt(shade, SHADE_TOLERANCE[s].rating)).map((s) => SPECIES_FACTS[s].name);
  return [
    {
      code: "shade_mix_low_tolerance",
      severity: shade === "heavy" && percent === 0 ? "risk" : "caution",
      message: TEXT.mixMessage(shade, formatNumber(percent, 0), tolerantNames.join(", "), !seasons.has("warm")),
      reason: TEXT.mixReason,
      source: `${SHADE_MIX_RULE.source}; shade tolerance: ${SHADE_TOLERANCE.fine_fescue.source}`,
      provenance: ratingsProvenance,
    },
  ];
}

/**
 * Post-pass over feed steps on a shaded lawn: nitrogen advice is scaled down. The step's own
 * words are kept and the shade amount added after them, so any feeding rule's steps get it.
 */
export function applyShadeNitrogen(ctx: PlanContext, steps: readonly PlanStep[]): PlanStep[] {
  const shade = shadeOf(ctx);
  if (shade === "none") return steps as PlanStep[];
  const factor = SHADE_NITROGEN.factor[shade];
  const area = ctx.input.visit.areaFt2;
  return steps.map((step) => {
    const n = step.feed?.nitrogenLbPer1000;
    if (step.kind !== "feed" || !step.feed || n === undefined) return step;
    // To the nearest 0.05 lb, as a spreader can be set.
    const reduced = Math.round(n * factor * 20) / 20;
    return {
      ...step,
      detail: step.detail + TEXT.nitrogen(formatNumber(reduced, 2), formatNumber((reduced * area) / 1000), formatNumber(area, 0)),
      feed: { ...step.feed, nitrogenLbPer1000: reduced },
      why: {
        text: step.why.text + TEXT.nitrogenWhy,
        source: `${step.why.source}; shade: ${SHADE_NITROGEN.source}`,
        provenance: step.why.provenance === "published" ? SHADE_NITROGEN.provenance : step.why.provenance,
      },
    };
  });
}

/** A plain note for the homeowner of a shaded lawn. */
export function shadeSteps(ctx: PlanContext): PlanStep[] {
  if (shadeOf(ctx) === "none") return [];
  const day = firstPlanDay(ctx);
  if (day > ctx.timeline.planEnd) return [];
  return [
    {
      key: oneOffKey("note", "shade_care"),
      date: ctx.dateOf(day),
      phase: ctx.phaseOf(day),
      kind: "note",
      title: TEXT.careTitle,
      detail: TEXT.careDetail,
      why: { text: TEXT.careWhy, source: SHADE_NITROGEN.source, provenance: SHADE_NITROGEN.provenance },
      cautions: [],
    },
  ];
}
