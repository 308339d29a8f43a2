import fc from "fast-check";
import { daysFromCivil, fromDayNumber, toDayNumber } from "../dates.ts";
import { SEEDING_SERVICES, type PlanInputRaw, type Service } from "../schemas/plan-input.ts";
import { SPECIES, type Species } from "../tables/species.ts";
import { SPRINKLER_TYPES } from "../tables/sprinklers.ts";

/*
 * Arbitraries that build only VALID plan inputs, so property tests exercise
 * the engine rather than the validator. Dates span several years so watering
 * days regularly cross the spring and autumn clock changes of each zone.
 */
export const ZONES = [
  "America/New_York",
  "Europe/Berlin",
  "Australia/Sydney",
  "America/Chicago",
  "America/Denver",
  "Australia/Lord_Howe",
  "America/Santiago",
  "UTC",
  // Frost-free: no frost date, no cold-ground season.
  "Pacific/Honolulu",
] as const;

const firstDay = daysFromCivil(2025, 1, 1);
const lastDay = daysFromCivil(2028, 12, 31);

export const isoDateArb = fc.integer({ min: firstDay, max: lastDay }).map(fromDayNumber);

const timeArb = fc
  .tuple(fc.integer({ min: 0, max: 23 }), fc.constantFrom(0, 15, 30, 45))
  .map(([h, m]) => `${String(h).padStart(2, "0")}:${String(m).padStart(2, "0")}`);

/** Percentages that add to exactly 100, one per species. */
const seedMixArb = fc
  .uniqueArray(fc.constantFrom(...SPECIES), { minLength: 1, maxLength: 3 })
  .chain((species: Species[]) =>
    fc
      .array(fc.integer({ min: 1, max: 20 }), { minLength: species.length, maxLength: species.length })
      .map((weights) => {
        const total = weights.reduce((a, b) => a + b, 0);
        const percents = weights.map((w) => Math.floor((w * 100) / total));
        percents[0] = (percents[0] ?? 0) + 100 - percents.reduce((a, b) => a + b, 0);
        return species.map((s, i) => ({ species: s, percent: percents[i] ?? 0 }));
      })
      .filter((entries) => entries.every((e) => e.percent > 0)),
  )
  .chain((entries) =>
    fc.tuple(
      ...entries.map((e) =>
        fc.record({
          species: fc.constant(e.species),
          percent: fc.constant(e.percent),
          purityPct: fc.integer({ min: 80, max: 100 }),
          germinationPct: fc.integer({ min: 60, max: 100 }),
        }),
      ),
    ),
  );

const productArb = fc
  .record({
    n: fc.integer({ min: 0, max: 46 }),
    p: fc.integer({ min: 0, max: 30 }),
    k: fc.integer({ min: 0, max: 20 }),
    rate: fc.double({ min: 0.5, max: 10, noNaN: true }),
    quick: fc.option(fc.boolean(), { nil: undefined }),
  })
  .map(({ n, p, k, rate, quick }) => ({
    name: `Feed ${n}-${p}-${k}`,
    analysis: { n, p, k },
    rateLbPer1000: Math.round(rate * 100) / 100,
    ...(quick === undefined ? {} : { quickReleaseN: quick }),
  }));

const extraServicesArb = fc.subarray(["aeration", "dethatching", "starter_fertiliser", "fertiliser_only", "top_dressing"] as Service[]);

const programArb = fc.record(
  {
    germinationDays: fc.integer({ min: 14, max: 35 }),
    wateringCyclesPerDayGermination: fc.integer({ min: 2, max: 5 }),
    firstMowMinDays: fc.integer({ min: 14, max: 42 }),
    weedAndFeedHoldDays: fc.integer({ min: 42, max: 180 }),
    highNQuickReleaseHoldDays: fc.integer({ min: 28, max: 90 }),
    deepWateringTime: timeArb,
  },
  { requiredKeys: [] },
);

/** Times early in the morning on purpose: that is where clock changes happen. */
const germinationTimesFor = (cycles: number) =>
  fc
    .uniqueArray(fc.integer({ min: 0, max: 23 * 4 + 3 }), { minLength: cycles, maxLength: cycles })
    .map((quarters) =>
      [...quarters]
        .sort((a, b) => a - b)
        .map((q) => `${String(Math.floor(q / 4)).padStart(2, "0")}:${String((q % 4) * 15).padStart(2, "0")}`),
    );

export const planInputArb: fc.Arbitrary<PlanInputRaw> = fc
  .record({
    date: isoDateArb,
    seeding: fc.option(fc.constantFrom(...SEEDING_SERVICES), { nil: undefined }),
    extra: extraServicesArb,
    seedMix: seedMixArb,
    rate: fc.double({ min: 0.25, max: 12, noNaN: true }),
    area: fc.integer({ min: 200, max: 60_000 }),
    products: fc.array(productArb, { maxLength: 2 }),
    lawnCondition: fc.constantFrom("thin", "bare", "thick_dormant", "thick") as fc.Arbitrary<"thin" | "bare" | "thick_dormant" | "thick">,
    irrigationKind: fc.constantFrom("in_ground", "hose_end", "none") as fc.Arbitrary<"in_ground" | "hose_end" | "none">,
    zones: fc.option(fc.integer({ min: 1, max: 12 }), { nil: undefined }),
    sprinklerType: fc.option(fc.constantFrom(...SPRINKLER_TYPES), { nil: undefined }),
    pr: fc.option(fc.double({ min: 0.2, max: 2.5, noNaN: true }), { nil: undefined }),
    current: fc.constantFrom(2, 2.5, 3, 3.5, 4, 4.5),
    highestExtra: fc.constantFrom(0, 0.5, 1),
    step: fc.option(fc.constantFrom(0.25, 0.5, 1), { nil: undefined }),
    zone: fc.constantFrom(...ZONES),
    // Frosts before the visit too: a late visit, or a dormant seeding.
    frostAfterDays: fc.option(fc.integer({ min: -150, max: 200 }), { nil: undefined }),
    // The lawn's grass: the species sown, or a cool- or warm-season lawn whatever was sown (winter ryegrass on bermudagrass).
    lawn: fc.constantFrom("sown", "cool", "warm") as fc.Arbitrary<"sown" | "cool" | "warm">,
    hemisphere: fc.option(fc.constantFrom("north", "south") as fc.Arbitrary<"north" | "south">, { nil: undefined }),
    // The plan made on a day around the visit (logged late, or imported).
    todayOffset: fc.option(fc.integer({ min: -20, max: 40 }), { nil: undefined }),
    program: programArb,
    customTimes: fc.boolean(),
    sprouts: fc.option(fc.integer({ min: 1, max: 40 }), { nil: undefined }),
    rainOffsets: fc.array(fc.integer({ min: 0, max: 60 }), { maxLength: 3 }),
  })
  .chain((base) => {
    const cycles = base.program.wateringCyclesPerDayGermination ?? 3;
    return fc.record({ base: fc.constant(base), times: base.customTimes ? germinationTimesFor(cycles).map((t) => t as string[] | undefined) : fc.constant(undefined) });
  })
  .map(({ base, times }) => {
    const services: Service[] = [...(base.seeding ? [base.seeding] : []), ...base.extra];
    if (services.length === 0) services.push("aeration");
    const seeding = base.seeding !== undefined;
    const visitDay = toDayNumber(base.date);
    const observations: NonNullable<NonNullable<PlanInputRaw["options"]>["observations"]> = [
      ...(base.sprouts === undefined ? [] : [{ kind: "sprouts_seen" as const, onDay: base.sprouts }]),
      ...base.rainOffsets.map((o) => ({ kind: "heavy_rain" as const, date: fromDayNumber(visitDay + o) })),
    ];
    return {
      visit: {
        date: base.date,
        services,
        seedMix: seeding ? base.seedMix : [],
        ...(seeding ? { seedRateLbPer1000: Math.round(base.rate * 100) / 100 } : {}),
        areaFt2: base.area,
        products: base.products,
      },
      property: {
        grassType: {
          species:
            base.lawn === "warm" ? ["bermudagrass"] : base.lawn === "cool" || !seeding ? ["tall_fescue"] : base.seedMix.map((e) => e.species),
        },
        ...(base.hemisphere === undefined ? {} : { hemisphere: base.hemisphere }),
        lawnCondition: base.lawnCondition,
        irrigation: {
          kind: base.irrigationKind,
          ...(base.zones === undefined ? {} : { zones: base.zones }),
          ...(base.sprinklerType === undefined ? {} : { sprinklerType: base.sprinklerType }),
          ...(base.pr === undefined ? {} : { precipitationRateInPerHour: Math.round(base.pr * 100) / 100 }),
        },
        currentMowingHeightIn: base.current,
        mowerHighestSettingIn: base.current + base.highestExtra,
        ...(base.step === undefined ? {} : { mowerSettingStepIn: base.step }),
        timeZone: base.zone,
        ...(base.frostAfterDays === undefined ? {} : { expectedFirstFrost: fromDayNumber(visitDay + base.frostAfterDays) }),
      },
      program: { ...base.program, ...(times ? { germinationWateringTimes: times } : {}) },
      options: { observations, ...(base.todayOffset === undefined ? {} : { today: fromDayNumber(visitDay + base.todayOffset) }) },
    } satisfies PlanInputRaw;
  });
