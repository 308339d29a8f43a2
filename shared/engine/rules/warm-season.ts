import type { PlanContext } from "../context.ts";
import { monthOfDayNumber } from "../dates.ts";
import { formatInches } from "../format.ts";
import type { Sourced, SourcedRange } from "../tables/provenance.ts";
import { SPECIES_FACTS, type Species, type SpeciesFacts } from "../tables/species.ts";
import { WARM_SEASON_MOWING_HEIGHT_IN, WINTER_RYEGRASS_MOWING_HEIGHT_IN } from "../tables/mowing.ts";
import {
  SPRING_TRANSITION,
  WARM_SEASON_GERMINATION_SOIL_F,
  WARM_SOIL_MONTHS,
  WINTER_OVERSEEDING_ADVISED_AGAINST,
  WINTER_OVERSEEDING_PREP,
  WINTER_RYEGRASS_SEED_LB_PER_1000,
} from "../tables/warm-season.ts";
import type { SeedRateBasis, WarningFinding, WarningSeverity } from "../types.ts";

// Texts first, so they can be turned into message keys together later.
const TEXT = {
  notAdvisedCrew: (names: string) =>
    `Winter ryegrass overseeding is usually advised against on ${names}: it can't be scalped for good seed contact, and the ryegrass crowds it as it greens up in spring.`,
  notAdvisedReason: "These grasses come out of winter slowly, and a stand of ryegrass shades and outcompetes them in spring.",
  notAdvisedHomeowner: (names: string) =>
    `The ryegrass gives winter color, but it can crowd your ${names} when it wakes up in spring. Follow the spring mowing advice in your plan, and send us a photo if the lawn looks slow to green up.`,
  notAdvisedHomeownerReason: "Ryegrass grows in the cool months and can shade a slow-waking summer grass in spring.",
  prepCrew:
    "No verticutting was logged: ryegrass seed needs soil contact through the bermudagrass. Verticut or rake hard after the low cut, before seeding.",
  prepReason: "Seed that sits on the thatch of a dormant warm-season lawn dries out before it can root.",
  springCrew: (height: string) =>
    `Spring transition: the lawn's warm-season grass will compete with the ryegrass. In spring, lower the mowing a notch at a time to about ${height} to help it come back.`,
  springReason: "Short ryegrass lets sun and warmth reach the summer grass, which then takes the lawn back as the ryegrass fades.",
  springHomeowner: (height: string) =>
    `Next spring, when your summer grass starts to green up, lower the mower one notch every week or two until you reach about ${height}. That helps it take over again from the ryegrass.`,
  coolSoilCrew: (names: string, min: number, max: number) =>
    `${names} seed needs soil about ${min}–${max} °F to sprout; at this time of year the soil is usually cooler, so the seed may lie until it warms.`,
  coolSoilReason: "Warm-season seed only germinates once the soil is warm, unlike cool-season seed which sprouts at about 50–65 °F.",
  coolSoilHomeownerReason: "Summer grasses sprout only in warm soil.",
  coolSoilHomeowner:
    "This seed sprouts only once the soil warms up, which may be weeks away. Keep it damp as your plan says; sprouts may come later than the dates shown.",
  emergenceCrew: (names: string, min: number, max: number) =>
    `${names} seed is slow to come up: expect sprouts in about ${min}–${max} days in warm soil, and a long establishment before the first frost.`,
  emergenceReason: "Warm-season seed is slower to sprout and to fill in than cool-season seed.",
  emergenceHomeowner: (min: number, max: number) =>
    `Your new grass may take about ${min}–${max} days to sprout, longer if the weather turns cool. Keep the seed damp every day until it does.`,
} as const;

/* ── What kind of seeding this is ───────────────────────────────────────────────────────────── */

/** Species the lawn is made of, as recorded on the property (may be empty when only "warm" was given). */
function lawnSpecies(ctx: PlanContext): readonly Species[] {
  return ctx.input.property.grassType.species;
}

/** A warm-season lawn, also when last winter's ryegrass was recorded among its grasses. */
function isWarmLawn(ctx: PlanContext): boolean {
  if (ctx.lawnSeason !== "mixed") return ctx.lawnSeason === "warm";
  let warm = false;
  for (const s of lawnSpecies(ctx)) {
    if (SPECIES_FACTS[s].season === "warm") warm = true;
    else if (s !== "perennial_ryegrass") return false;
  }
  return warm;
}

/**
 * Cool-season seed (in practice ryegrass) sown into an established warm-season lawn: winter overseeding
 * for color. Its window is the season check's business; this only says what kind of work it is.
 */
export function isWinterOverseeding(ctx: PlanContext): boolean {
  const { visit, property } = ctx.input;
  if (!isWarmLawn(ctx) || visit.seedMix.length === 0) return false;
  if (property.lawnCondition === "bare" || ctx.services.has("new_seeding")) return false;
  for (const entry of visit.seedMix) if (SPECIES_FACTS[entry.species].season !== "cool") return false;
  return true;
}

/** The expected seed-rate range of one species for a kind of seeding. */
export function seedRangeFor(basis: SeedRateBasis, facts: SpeciesFacts): SourcedRange {
  if (basis === "new_seeding") return facts.newSeedingLbPer1000;
  // Only ryegrass has a winter figure; any other cool-season seed keeps its ordinary overseeding range.
  if (basis === "winter_overseeding" && facts.species === "perennial_ryegrass") return WINTER_RYEGRASS_SEED_LB_PER_1000;
  return facts.overseedingLbPer1000;
}

function warmSeedEntries(ctx: PlanContext): SpeciesFacts[] {
  const facts: SpeciesFacts[] = [];
  for (const entry of ctx.input.visit.seedMix) {
    const f = SPECIES_FACTS[entry.species];
    if (f.season === "warm") facts.push(f);
  }
  return facts;
}

const namesOf = (facts: readonly { name: string }[]) => facts.map((f) => f.name).join(", ");

/**
 * How low to take the lawn before winter ryegrass: scalp a bermudagrass lawn, and take any other
 * warm-season lawn one mower setting lower than usual. Null when this is not winter overseeding.
 */
export function winterOverseedingPrepHeight(ctx: PlanContext, settingStepIn: number): { heightIn: number } & Sourced | null {
  if (!isWinterOverseeding(ctx)) return null;
  const species = lawnSpecies(ctx);
  const { property } = ctx.input;
  const usual = Math.min(property.currentMowingHeightIn, property.mowerHighestSettingIn);
  if (species.includes("bermudagrass") && species.every((s) => s === "bermudagrass" || s === "perennial_ryegrass")) {
    return {
      heightIn: WINTER_OVERSEEDING_PREP.scalpHeightIn,
      source: WINTER_OVERSEEDING_PREP.scalpSource,
      provenance: WINTER_OVERSEEDING_PREP.scalpProvenance,
    };
  }
  return {
    heightIn: Math.max(0.5, Math.round((usual - settingStepIn) * 1000) / 1000),
    source: WINTER_OVERSEEDING_PREP.notchLowerSource,
    provenance: WINTER_OVERSEEDING_PREP.notchLowerProvenance,
  };
}

/**
 * How low to take the lawn in spring: the low end of its summer grass's range, when that is below the
 * ryegrass's winter height. A tall summer grass (St. Augustine, bahia) or an unknown one gets no figure.
 */
function springHeightText(ctx: PlanContext): string | null {
  let height: number | null = null;
  for (const s of lawnSpecies(ctx)) {
    const range = WARM_SEASON_MOWING_HEIGHT_IN[s];
    if (range && (height === null || range.min < height)) height = range.min;
  }
  return height === null || height >= WINTER_RYEGRASS_MOWING_HEIGHT_IN.min ? null : formatInches(height);
}

/* ── Findings ───────────────────────────────────────────────────────────────────────────────── */

function finding(code: string, severity: WarningSeverity, message: string, reason: string, sourced: Sourced): WarningFinding {
  return { code, severity, message, reason, source: sourced.source, provenance: sourced.provenance };
}

function winterOverseedingFindings(ctx: PlanContext, out: WarningFinding[]): void {
  const against = lawnSpecies(ctx).filter((s) => WINTER_OVERSEEDING_ADVISED_AGAINST.species.includes(s));
  if (against.length > 0) {
    const names = namesOf(against.map((s) => SPECIES_FACTS[s]));
    out.push(finding("winter_overseeding_not_advised", "caution", TEXT.notAdvisedCrew(names), TEXT.notAdvisedReason, WINTER_OVERSEEDING_ADVISED_AGAINST));
  }
  if (!ctx.services.has("dethatching")) {
    out.push(finding("winter_overseeding_prep", "info", TEXT.prepCrew, TEXT.prepReason, { source: WINTER_OVERSEEDING_PREP.scalpSource, provenance: WINTER_OVERSEEDING_PREP.scalpProvenance }));
  }
  out.push(
    finding("winter_ryegrass_spring_transition", "info", TEXT.springCrew(springHeightText(ctx) ?? "the lawn's summer height"), TEXT.springReason, SPRING_TRANSITION),
  );
}

const capitalized = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** Days to emerge across the warm species sown: the fastest's minimum to the slowest's maximum. */
function emergenceSpan(warm: readonly SpeciesFacts[]): { min: number; max: number; slowest: SpeciesFacts } {
  let slowest = warm[0] as SpeciesFacts;
  let min = Infinity;
  for (const f of warm) {
    min = Math.min(min, f.emergenceDays.min);
    if (f.emergenceDays.max > slowest.emergenceDays.max) slowest = f;
  }
  return { min, max: slowest.emergenceDays.max, slowest };
}

function warmSeedingFindings(ctx: PlanContext, warm: readonly SpeciesFacts[], out: WarningFinding[]): void {
  const names = capitalized(namesOf(warm));
  if (!WARM_SOIL_MONTHS[ctx.hemisphere].includes(monthOfDayNumber(ctx.visitDay))) {
    const soil = WARM_SEASON_GERMINATION_SOIL_F;
    out.push(finding("warm_season_seed_cool_soil", "caution", TEXT.coolSoilCrew(names, soil.min, soil.max), TEXT.coolSoilReason, soil));
  }
  const span = emergenceSpan(warm);
  out.push(finding("warm_season_seed_emergence", "info", TEXT.emergenceCrew(names, span.min, span.max), TEXT.emergenceReason, span.slowest.emergenceDays));
}

/** Warm-season findings for the crew; WARM_SEASON_HOMEOWNER words those a homeowner can act on. */
export function warmSeasonWarnings(ctx: PlanContext): WarningFinding[] {
  if (!ctx.seeding) return [];
  const out: WarningFinding[] = [];
  if (isWinterOverseeding(ctx)) winterOverseedingFindings(ctx, out);
  const warm = warmSeedEntries(ctx);
  if (warm.length > 0) warmSeedingFindings(ctx, warm, out);
  return out;
}

type HomeownerWording = Pick<WarningFinding, "message" | "reason"> & { severity: WarningSeverity };

/** Homeowner versions, in plain words (same conventions as rules/audiences.ts, which spreads this in). */
export const WARM_SEASON_HOMEOWNER: Readonly<Record<string, (ctx: PlanContext, finding: WarningFinding) => HomeownerWording | null>> = {
  winter_overseeding_not_advised: (ctx) => {
    const against = lawnSpecies(ctx).filter((s) => WINTER_OVERSEEDING_ADVISED_AGAINST.species.includes(s));
    return {
      severity: "info",
      message: TEXT.notAdvisedHomeowner(namesOf(against.map((s) => SPECIES_FACTS[s]))),
      reason: TEXT.notAdvisedHomeownerReason,
    };
  },
  winter_ryegrass_spring_transition: (ctx) => ({
    severity: "info",
    message: TEXT.springHomeowner(springHeightText(ctx) ?? "your usual summer height"),
    reason: TEXT.springReason,
  }),
  warm_season_seed_cool_soil: () => ({ severity: "caution", message: TEXT.coolSoilHomeowner, reason: TEXT.coolSoilHomeownerReason }),
  warm_season_seed_emergence: (ctx) => {
    const span = emergenceSpan(warmSeedEntries(ctx));
    return { severity: "info", message: TEXT.emergenceHomeowner(span.min, span.max), reason: TEXT.emergenceReason };
  },
};
