import type { PlanContext } from "../context.ts";
import { formatNumber } from "../format.ts";
import { weightedRange } from "../mix.ts";
import { SEEDING_SERVICES } from "../schemas/plan-input.ts";
import { SOURCES } from "../tables/sources.ts";
import { SPECIES_FACTS } from "../tables/species.ts";
import { FROST_RULE } from "../tables/timing.ts";
// The rules here find; rules/audiences.ts words each finding for the crew and, where it helps, the homeowner.
import type { WarningFinding as PlanWarning, SeedRateBasis } from "../types.ts";
import { isHighNQuickRelease } from "./feeding.ts";
import { isAutumnVisit } from "./seasonal.ts";
import { assumedRatePhrase } from "./watering-notes.ts";
import { isWinterOverseeding, seedRangeFor } from "./warm-season.ts";
import { seasonFindings } from "./season-advice.ts";

/** How far outside the species range (as a fraction of the range's edge) turns a caution into a risk. */
const FAR_OUTSIDE_RANGE = 0.5;

/** Frost thresholds: under 30 days = risk, 30–45 = caution, over 45 = fine (common practice). */
export function frostWarning(daysToFrost: number): PlanWarning | null {
  if (daysToFrost > FROST_RULE.cautionUpToDays) return null;
  const risk = daysToFrost < FROST_RULE.riskBelowDays;
  return {
    code: "frost_too_close",
    severity: risk ? "risk" : "caution",
    message: risk
      ? `Only ${daysToFrost} days until the expected first frost: the new grass may not survive the winter.`
      : `${daysToFrost} days until the expected first frost: the new grass will be young going into the cold.`,
    reason: `New seed needs at least ${FROST_RULE.riskBelowDays}–${FROST_RULE.cautionUpToDays} days of growth before the first hard frost.`,
    source: FROST_RULE.source,
    provenance: FROST_RULE.provenance,
  };
}

/** Which seeding-rate range applies: a new lawn uses the new-seeding range, anything sown into turf the overseeding range. */
export function seedRateBasis(ctx: PlanContext): SeedRateBasis {
  if (isWinterOverseeding(ctx)) return "winter_overseeding";
  return ctx.services.has("new_seeding") || ctx.input.property.lawnCondition === "bare" ? "new_seeding" : "overseeding";
}

export function expectedSeedRange(ctx: PlanContext): { min: number; max: number; basis: SeedRateBasis } {
  const basis = seedRateBasis(ctx);
  const range = weightedRange(ctx.input.visit.seedMix, (f) => seedRangeFor(basis, f));
  return { ...range, basis };
}

function seedRateWarning(ctx: PlanContext): PlanWarning | null {
  const rate = ctx.input.visit.seedRateLbPer1000;
  if (!ctx.seeding || rate === undefined || ctx.input.visit.seedMix.length === 0) return null;
  const range = expectedSeedRange(ctx);
  const below = rate < range.min - 1e-9;
  const above = rate > range.max + 1e-9;
  if (!below && !above) return null;
  const far = below ? rate < range.min * (1 - FAR_OUTSIDE_RANGE) : rate > range.max * (1 + FAR_OUTSIDE_RANGE);
  const sources = [...new Set(ctx.input.visit.seedMix.map((e) => {
    return seedRangeFor(range.basis, SPECIES_FACTS[e.species]).source;
  }))];
  const provenances = ctx.input.visit.seedMix.map((e) => {
    return seedRangeFor(range.basis, SPECIES_FACTS[e.species]).provenance;
  });
  return {
    code: below ? "seed_rate_low" : "seed_rate_high",
    severity: far ? "risk" : "caution",
    message: `Seed rate ${formatNumber(rate, 2)} lb per 1,000 ft² is ${below ? "below" : "above"} the usual ${formatNumber(range.min, 2)}–${formatNumber(range.max, 2)} lb for this mix.`,
    reason: below
      ? "Too little seed leaves a thin stand that weeds fill in."
      : "Too much seed crowds seedlings, which then compete and are prone to disease.",
    source: sources.join("; "),
    provenance: provenances.includes("from memory") ? "from memory" : provenances.includes("common practice") ? "common practice" : "published",
  };
}

export function planWarnings(ctx: PlanContext): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  const { visit, property } = ctx.input;
  const add = (w: PlanWarning | null) => {
    if (w) warnings.push(w);
  };

  // The entered frost still ahead: warn by days left. A passed or assumed frost, a dormant seeding
  // or any other out-of-window work is the season check's to report.
  const frostAhead = ctx.seeding && ctx.input.property.expectedFirstFrost !== undefined && !ctx.season.check.firstFrostAssumed;
  const frost = frostAhead && ctx.frostDay !== null && ctx.frostDay > 0 && ctx.season.sowingStartDay === 0 ? frostWarning(ctx.frostDay) : null;
  add(frost);
  for (const finding of seasonFindings(ctx, frost !== null)) add(finding);

  const sowingIntoTurf = visit.services.some((s) => s === "overseeding" || s === "slit_seeding");
  if (sowingIntoTurf && ctx.lawnSeason === "warm" && isAutumnVisit(ctx)) {
    const ryegrassOnly = visit.seedMix.length > 0 && visit.seedMix.every((e) => e.species === "perennial_ryegrass");
    add({
      code: "warm_season_autumn_overseeding",
      severity: ryegrassOnly ? "info" : "caution",
      message: ryegrassOnly
        ? "Ryegrass sown into a warm-season lawn in the fall gives winter color only; it will not thicken the lawn itself."
        : "Overseeding a warm-season lawn in the fall is not advised: these grasses spread by runners and go dormant in the cold.",
      reason: "Warm-season lawns thicken by stolons and rhizomes during summer growth, not from fall seed.",
      source: SOURCES.tradePractice,
      provenance: "common practice",
    });
  }

  add(seedRateWarning(ctx));

  if (ctx.seeding && (property.lawnCondition === "thick_dormant" || property.lawnCondition === "thick")) {
    const dormant = property.lawnCondition === "thick_dormant";
    add({
      code: dormant ? "dormant_lawn_seeded" : "thick_lawn_seeded",
      severity: dormant ? "caution" : "info",
      message: dormant
        ? "This lawn is thick but brown: it is most likely dormant, not dead. Watering and feeding would bring it back without seed."
        : "This lawn is already thick; seed has little room to take.",
      reason: "A thick lawn that only looks brown after summer is dormant; water and feed it instead of overseeding.",
      source: SOURCES.tradePractice,
      provenance: "common practice",
    });
  }

  if (visit.seedMix.length > 0 && !visit.services.some((s) => SEEDING_SERVICES.includes(s))) {
    add({
      code: "seed_without_seeding_service",
      severity: "caution",
      message: "Seed was logged but no seeding service was recorded. The plan treats the visit as a seeding.",
      reason: "Any seed put down needs the germination watering, mowing and hold-off schedule.",
      source: SOURCES.sproutlineChoice,
      provenance: "common practice",
    });
  }

  if (ctx.seeding && visit.products.some(isHighNQuickRelease)) {
    add({
      code: "high_n_quick_release_on_seed",
      severity: "risk",
      message: "A high-nitrogen quick-release product was applied on new seed.",
      reason: "Quick-release nitrogen can burn seedlings and favor top growth over roots.",
      source: SOURCES.tradePractice,
      provenance: "common practice",
    });
  }

  const rarelySeeded = visit.seedMix.filter((e) => !SPECIES_FACTS[e.species].commonlySeeded);
  if (rarelySeeded.length > 0) {
    add({
      code: "species_rarely_seeded",
      severity: "caution",
      message: `${rarelySeeded.map((e) => SPECIES_FACTS[e.species].name).join(", ")} is normally planted as sod or plugs; timings for seed are rough.`,
      reason: "Seed of this grass is scarce and its emergence and rate figures are recalled, not published.",
      source: SOURCES.landGrantWarmSeason,
      provenance: "from memory",
    });
  }

  if (ctx.seeding && property.irrigation.kind === "none") {
    add({
      code: "no_sprinkler_for_seed",
      severity: "caution",
      message: "No sprinkler: keeping new seed damp several times a day by hand is hard work and often fails.",
      reason: "Seed that dries out after it starts to sprout dies.",
      source: SOURCES.nebraskaColumn2021,
      provenance: "published",
    });
  }

  if (ctx.seeding && !ctx.precipitationRateMeasured && property.irrigation.kind !== "none") {
    add({
      code: "precipitation_rate_estimated",
      severity: "info",
      message: `Watering minutes assume ${assumedRatePhrase(ctx)} until a catch-can test measures it.`,
      reason: "Minutes per cycle = depth wanted ÷ precipitation rate × 60.",
      source: ctx.sprinklerDefault ? `${SOURCES.irrigationAssociation}; rate: ${ctx.sprinklerDefault.rateInPerHour.source}` : SOURCES.irrigationAssociation,
      provenance: "from memory",
    });
  }
  return warnings;
}
