import type { PlanContext } from "../context.ts";
import { formatDate } from "../format.ts";
import { oneOffKey } from "../step-keys.ts";
import {
  COLD_SOIL_RULE,
  COOL_SEEDING_WINDOW,
  DEFAULT_FIRST_FROST,
  SOIL_WARMS,
  SPRING_PRE_EMERGENT_RULE,
  SUMMER_SEEDING_RULE,
  WARM_SEEDING_WINDOW,
  WINTER_RYEGRASS_WINDOW,
  CARE_WINDOW,
  WARM_NITROGEN_CUTOFF,
} from "../tables/seasons.ts";
import { inRanges } from "./season.ts";
import { FROST_RULE } from "../tables/timing.ts";
import type { Why } from "../tables/provenance.ts";
import type { PlanStep, PlanWarning, WarningFinding, WarningSeverity } from "../types.ts";

/*
 * What the season check (rules/season.ts) tells people: findings for the crew, their
 * homeowner wordings (merged into rules/audiences.ts), and the few steps of the
 * dormant-seeding path. Texts first, so they can be turned into message keys together.
 */

const TEXT = {
  springSeeding: {
    message: (end: string) =>
      `Spring seeding of a cool-season lawn: seedlings meet summer heat and crabgrass before their roots are deep. Late summer (from about ${end}) is the better window. Crabgrass preventers stop grass seed too: none on the seeded areas this spring unless the product's label allows use at seeding (a few actives are labelled for it).`,
    reason: "Cool-season seed does best sown as the soil cools in late summer; spring seedings face heat and weed competition in their first summer.",
    homeowner: "New grass sown in spring has to get through its first summer young. Keep the watering going, and don't spread a crabgrass preventer or weed-and-feed on the seeded areas this spring unless the bag says it is safe for new seed. Ask us if unsure.",
    homeownerReason: "Most crabgrass preventers stop grass seed from growing as well as crabgrass.",
  },
  summerSeeding: {
    message: (start: string) =>
      `Summer seeding of a cool-season lawn: heat dries the seedbed within hours and stresses seedlings. The plan adds a light watering a day; late summer (from about ${start}) is the better window.`,
    reason: "Cool-season seed germinates best in soil of about 50–65 °F; summer heat dries and stresses seedlings.",
    homeowner: "Hot weather dries new seed fast, so your plan has one more short watering a day. On very hot afternoons check the seeded areas and give them a light extra watering if the surface looks dry.",
    homeownerReason: "Seed that dries out after it starts to sprout dies, and summer heat dries the surface quickly.",
  },
  seedingLateCool: (frost: string, passed: boolean) =>
    `Seeded ${passed ? "after" : "close to"} the first frost (${frost}): seedlings that come up now may not survive the winter, and seed that does not sprout before the ground turns cold waits for spring.`,
  seedingLateWarm: (frost: string) =>
    `Warm-season seed needs about 60–90 days of growth before the first frost (${frost}); seedlings this late may not survive the winter.`,
  seedingLateReason: "Young grass needs weeks of growth before the cold; seed on cold soil does not sprout until spring.",
  seedingLateHomeowner: "It is late in the year for new grass. Follow the watering in your plan while it lasts; in spring, send us a photo of any thin or bare spots so we can take a look.",
  seedingLateHomeownerReason: "Some seed sown late only sprouts once the soil warms again in spring.",
  dormant: (spring: string) =>
    `Dormant seeding: the soil is too cold for seed to sprout. No germination watering, mowing or feeding until the soil warms (about ${spring}); germination is expected then, so the hold-offs (crabgrass preventers included) count from then. Good seed-to-soil contact matters, and some seed is lost to birds and washing over winter.`,
  dormantWarm: (spring: string) =>
    `Warm-season seed sown on cold soil waits until the soil is about 65–70 °F (about ${spring}); this seed is normally sown in late spring, and more of it is lost over winter.`,
  dormantReason: "Seed sown on cold soil lies dormant and sprouts when the soil warms in spring.",
  dormantHomeowner: (spring: string) =>
    `The seed sown today rests over the winter and sprouts when the soil warms, around ${spring}. There is nothing to water until then; your plan picks up in spring. Don't spread a crabgrass preventer or weed-and-feed on the seeded areas in spring: it would stop the seed too.`,
  dormantHomeownerReason: "Seed on cold soil waits for spring; watering it now would not help and can freeze.",
  winterRyegrassEarly: (start: string) =>
    `Ryegrass sown while the warm-season lawn is still growing strongly is crowded out by it. About 3–4 weeks before the first frost (from about ${start}) is the usual time.`,
  winterRyegrassLate: (frost: string) =>
    `Ryegrass sown this close to or after the first frost (${frost}) comes up slowly and thin, giving less winter color.`,
  winterRyegrassReason: "Winter ryegrass is sown as the warm-season lawn slows down in fall, about 3–4 weeks before the first frost.",
  careSummer: "Aeration, dethatching and feeding stress a cool-season lawn in summer heat; fall (or spring) is the better time.",
  careSummerReason: "Cool-season grasses grow and recover in the cool months and slow down in summer.",
  careLate: (spring: string) =>
    `Past the growing season: the lawn will not recover from the work until it grows again (about ${spring}); no feeding is planned until then.`,
  careLateReason: "No fertilizer on cold or frozen ground, and warm-season lawns get no nitrogen from late summer on.",
  careBeforeSpring: (spring: string) =>
    `The ground is still cold: the lawn recovers from this work and uses feeding only once it grows again (about ${spring}); no feeding is planned until then.`,
  careLateWarm:
    "Late summer for a warm-season lawn: no more nitrogen this season (it feeds winter disease and cold injury); aeration now has only a few weeks of growth left to recover.",
  nitrogenLateWarm: "Nitrogen was put down on a warm-season lawn after the late-summer cut-off; check the product label and any local fertilizer dates.",
  nitrogenColdGround: "Nitrogen was put down on cold or frozen ground, where it washes off instead of feeding the grass; check the product label and any local fertilizer dates.",
  careLateHomeowner: (spring: string) =>
    `Your lawn is resting for the season. Hold off on any fertilizer until it grows again in spring (around ${spring}).`,
  frostAssumed: (frost: string) =>
    `No first-frost date was entered: the plan assumes about ${frost}. Enter the local date for exact watering and feeding cut-offs.`,
  frostAssumedReason: "Watering stops and the last feeding are set from the first frost.",
  wakeUpTitle: "The soil is warming: watch for sprouts",
  wakeUpDetail: "Seed sown over the winter starts to sprout as the soil warms, over the next few weeks. Start the light waterings in your plan when you see sprouts, or sooner if the surface dries out. Send us a photo if nothing shows in a month.",
  restTitle: "Nothing to water: the seed rests until spring",
  restDetail: (spring: string) =>
    `The soil is too cold for seed to sprout. Keep off the seeded areas where you can; your plan picks up around ${spring}.`,
  coldStopTitle: "The ground is turning cold: stop watering for the season",
  coldStopDetail: "Any seed that has not sprouted waits for spring. Drain hoses and have sprinkler systems blown out before pipes freeze.",
  whyDormant: "Seed on cold soil lies dormant; it sprouts when the soil warms in spring.",
  whyCold: "Grass and seed use almost no water on cold ground, and water in pipes and hoses can freeze.",
} as const;

const dormantWhy: Why = { text: TEXT.whyDormant, source: SOIL_WARMS.source, provenance: SOIL_WARMS.provenance };
const coldWhy: Why = { text: TEXT.whyCold, source: COLD_SOIL_RULE.source, provenance: COLD_SOIL_RULE.provenance };

/** Frost text, saying when it is the default rather than the entered date. */
function frostText(ctx: PlanContext): string {
  const { firstFrost, firstFrostAssumed } = ctx.season.check;
  return firstFrost === null ? "" : `${formatDate(firstFrost)}${firstFrostAssumed ? ", assumed" : ""}`;
}

/** The crew's findings of the season check. `frostWarned`: the entered-frost warning already covers a late seeding. */
export function seasonFindings(ctx: PlanContext, frostWarned: boolean): WarningFinding[] {
  const check = ctx.season.check;
  const out: WarningFinding[] = [];
  const add = (code: string, severity: WarningSeverity, message: string, reason: string, source: string, provenance: WarningFinding["provenance"]) =>
    out.push({ code, severity, message, reason, source, provenance });
  const spring = check.soilWarms ? formatDate(check.soilWarms) : "";
  const sowing = check.sowingStarts ? formatDate(check.sowingStarts) : spring;
  const windowStart = check.window ? formatDate(check.window.start) : "";

  if (check.work === "seeding") {
    if (check.verdict === "early" && !check.sowingStarts && check.family === "cool") {
      if (check.period === "spring") {
        add("spring_seeding", "caution", TEXT.springSeeding.message(windowStart), TEXT.springSeeding.reason, `${COOL_SEEDING_WINDOW.source}; ${SPRING_PRE_EMERGENT_RULE.source}`, SPRING_PRE_EMERGENT_RULE.provenance);
      } else {
        add("summer_seeding", "caution", TEXT.summerSeeding.message(windowStart), TEXT.summerSeeding.reason, `${COOL_SEEDING_WINDOW.source}; ${SUMMER_SEEDING_RULE.source}`, SUMMER_SEEDING_RULE.provenance);
      }
    }
    if (check.verdict === "late" && !frostWarned) {
      const passed = (ctx.frostDay ?? 1) <= 0;
      const warm = check.family === "warm";
      add(
        "seeding_late",
        "risk",
        warm ? TEXT.seedingLateWarm(frostText(ctx)) : TEXT.seedingLateCool(frostText(ctx), passed),
        TEXT.seedingLateReason,
        warm ? WARM_SEEDING_WINDOW.source : FROST_RULE.source,
        warm ? WARM_SEEDING_WINDOW.provenance : FROST_RULE.provenance,
      );
    }
    if (check.sowingStarts) {
      const warm = check.family === "warm";
      add(
        check.verdict === "dormant_seeding" ? "dormant_seeding" : "seed_waits_for_warm_soil",
        warm ? "caution" : "info",
        warm ? TEXT.dormantWarm(sowing) : TEXT.dormant(sowing),
        TEXT.dormantReason,
        `${COLD_SOIL_RULE.source}; ${SOIL_WARMS.source}`,
        SOIL_WARMS.provenance,
      );
    }
  } else if (check.work === "winter_overseeding" && check.verdict !== "in_window") {
    const early = check.verdict === "early";
    add(
      early ? "winter_overseeding_early" : "winter_overseeding_late",
      "caution",
      early ? TEXT.winterRyegrassEarly(windowStart) : TEXT.winterRyegrassLate(frostText(ctx)),
      TEXT.winterRyegrassReason,
      WINTER_RYEGRASS_WINDOW.source,
      WINTER_RYEGRASS_WINDOW.provenance,
    );
  } else if (check.work === "care" && check.verdict !== "in_window") {
    const coldGround = inRanges(0, ctx.season.wateringClosed) !== null;
    if (check.verdict === "early" && check.period === "summer") {
      add("care_in_summer_heat", "caution", TEXT.careSummer, TEXT.careSummerReason, CARE_WINDOW.source, CARE_WINDOW.provenance);
    } else if (check.verdict === "early") {
      add("care_before_spring", "info", TEXT.careBeforeSpring(spring), TEXT.careLateReason, SOIL_WARMS.source, SOIL_WARMS.provenance);
    } else if (coldGround) {
      add("care_after_season", "info", TEXT.careLate(spring), TEXT.careLateReason, COLD_SOIL_RULE.source, COLD_SOIL_RULE.provenance);
    } else {
      add("care_late_warm_season", "info", TEXT.careLateWarm, TEXT.careLateReason, WARM_NITROGEN_CUTOFF.source, WARM_NITROGEN_CUTOFF.provenance);
    }
  }
  const nitrogenNow = ctx.input.visit.products.some((p) => p.analysis.n > 0);
  if (nitrogenNow && inRanges(0, ctx.season.feedingClosed) !== null) {
    const warm = ctx.season.check.family === "warm" && check.work === "care";
    add("nitrogen_after_cutoff", "risk", warm ? TEXT.nitrogenLateWarm : TEXT.nitrogenColdGround, TEXT.careLateReason, warm ? WARM_NITROGEN_CUTOFF.source : COLD_SOIL_RULE.source, warm ? WARM_NITROGEN_CUTOFF.provenance : COLD_SOIL_RULE.provenance);
  }
  if (check.firstFrostAssumed && check.firstFrost !== null && !ctx.input.property.expectedFirstFrost && (ctx.seeding || out.length > 0)) {
    add("first_frost_assumed", "info", TEXT.frostAssumed(formatDate(check.firstFrost)), TEXT.frostAssumedReason, DEFAULT_FIRST_FROST.source, DEFAULT_FIRST_FROST.provenance);
  }
  return out;
}

type HomeownerWording = Pick<PlanWarning, "message" | "reason" | "severity">;

/** Homeowner wordings of the season findings a homeowner can act on (merged into rules/audiences.ts). */
export const SEASON_HOMEOWNER: Readonly<Record<string, (ctx: PlanContext, finding: WarningFinding) => HomeownerWording | null>> = {
  spring_seeding: () => ({ severity: "caution", message: TEXT.springSeeding.homeowner, reason: TEXT.springSeeding.homeownerReason }),
  summer_seeding: () => ({ severity: "caution", message: TEXT.summerSeeding.homeowner, reason: TEXT.summerSeeding.homeownerReason }),
  seeding_late: () => ({ severity: "caution", message: TEXT.seedingLateHomeowner, reason: TEXT.seedingLateHomeownerReason }),
  dormant_seeding: (ctx) => ({
    severity: "info",
    message: TEXT.dormantHomeowner(formatDate(ctx.season.check.sowingStarts ?? ctx.dateOf(ctx.season.sowingStartDay))),
    reason: TEXT.dormantHomeownerReason,
  }),
  seed_waits_for_warm_soil: (ctx) => ({
    severity: "info",
    message: TEXT.dormantHomeowner(formatDate(ctx.season.check.sowingStarts ?? ctx.dateOf(ctx.season.sowingStartDay))),
    reason: TEXT.dormantHomeownerReason,
  }),
  care_after_season: (ctx) => ({
    severity: "info",
    message: TEXT.careLateHomeowner(formatDate(ctx.season.check.soilWarms ?? ctx.dateOf(0))),
    reason: TEXT.careLateReason,
  }),
};

/** The dormant-seeding path's own steps: a note that there is nothing to water, and the spring wake-up. */
export function dormantSeedingSteps(ctx: PlanContext): PlanStep[] {
  const start = ctx.season.sowingStartDay;
  if (start <= 0 || ctx.timeline.germinationEnd === null) return [];
  const springText = formatDate(ctx.dateOf(start));
  return [
    {
      key: oneOffKey("note", "seed_rests"),
      date: ctx.dateOf(0),
      phase: ctx.phaseOf(0),
      kind: "note",
      title: TEXT.restTitle,
      detail: TEXT.restDetail(springText),
      why: dormantWhy,
      cautions: [],
    },
    {
      key: oneOffKey("note", "spring_wake_up"),
      date: ctx.dateOf(start),
      phase: ctx.phaseOf(start),
      kind: "note",
      title: TEXT.wakeUpTitle,
      detail: TEXT.wakeUpDetail,
      why: dormantWhy,
      cautions: ["watering_restrictions"],
    },
  ];
}

/** Said once when cold ground cuts planned watering short (a late seeding's light waterings, say). */
export function coldGroundStopNote(ctx: PlanContext, firstClosedDay: number): PlanStep {
  return {
    key: oneOffKey("note", "cold_ground_stop_watering"),
    date: ctx.dateOf(firstClosedDay),
    phase: ctx.phaseOf(firstClosedDay),
    kind: "note",
    title: TEXT.coldStopTitle,
    detail: TEXT.coldStopDetail,
    why: coldWhy,
    cautions: [],
  };
}
