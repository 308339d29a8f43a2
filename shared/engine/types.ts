import type { NutrientAmounts } from "../calculators/fertilizer.ts";
import type { IsoDate } from "./dates.ts";
import type { CautionId } from "./tables/cautions.ts";
import type { Provenance, Why } from "./tables/provenance.ts";
import type { Species } from "./tables/species.ts";
import type { Hemisphere } from "./tables/timing.ts";

export type Phase = "prep" | "germination" | "establishment" | "maturing";

export type StepKind =
  | "water"
  | "mow"
  | "feed"
  | "leaf_cleanup"
  | "check_in_photo"
  | "prep_mow"
  | "flag_hazards"
  | "clear_debris"
  | "note";

export type HoldOffKind =
  | "weed_and_feed"
  | "broadleaf_herbicide"
  | "crabgrass_pre_emergent"
  | "high_n_quick_release"
  | "heavy_traffic"
  /** Before seeding: a pre-emergent put down earlier may still stop more seed (rules/pre-emergent.ts). */
  | "new_seed";

export type StepState = "done" | "skipped";

export interface FeedAdvice {
  readonly product: "starter" | "slow_release_n";
  /** Always false from this engine; kept explicit so checks can prove it. */
  readonly highNQuickRelease: boolean;
  readonly nitrogenLbPer1000?: number;
}

export interface CycleAndSoak {
  readonly runsPerCycle: number;
  readonly soakMinutes: number;
  /** The cycle's minutes before it was split; runs never add up to more. */
  readonly minutesBefore: number;
  /** The first run of each watering ("HH:MM", sorted): one reminder, one calendar event per watering, not per run. */
  readonly cycleStarts: readonly string[];
}

export interface PlanStep {
  /** Stable across recomputes: daily steps carry their date, one-off steps do not. */
  readonly key: string;
  readonly date: IsoDate;
  readonly phase: Phase;
  readonly kind: StepKind;
  readonly title: string;
  readonly detail: string;
  /** Local wall-clock start times ("HH:MM") for watering cycles, all real times in the zone. */
  readonly times?: readonly string[];
  readonly minutesPerCycle?: number;
  /** Set on slopes: each cycle is split into runs of `minutesPerCycle` with a pause between (rules/slopes.ts). */
  readonly cycleAndSoak?: CycleAndSoak;
  readonly heightIn?: number;
  readonly feed?: FeedAdvice;
  /** Hold-off windows this step must never fall inside. */
  readonly restrictedBy?: readonly HoldOffKind[];
  readonly why: Why;
  readonly cautions: readonly CautionId[];
  /** Set when the homeowner ticked the step off or skipped it. */
  readonly state?: StepState;
}

export interface HoldOff {
  readonly kind: HoldOffKind;
  readonly start: IsoDate;
  /** Last day of the hold-off, inclusive. */
  readonly end: IsoDate;
  readonly why: string;
  readonly source: string;
  readonly provenance: Provenance;
  readonly cautions: readonly CautionId[];
}

export type WarningSeverity = "risk" | "caution" | "info";

/** Who a warning is written for: the crew doing the work, or the homeowner looking after the lawn. */
export type WarningAudience = "crew" | "homeowner";

/** What a warning rule found, before it is worded for anyone (rules/audiences.ts does that). */
export interface WarningFinding {
  readonly code: string;
  readonly severity: WarningSeverity;
  readonly message: string;
  readonly reason: string;
  readonly source: string;
  readonly provenance: Provenance;
}

/**
 * A finding told to one audience. A finding that matters to both appears twice under the same
 * code: once in the crew's terms, once in plain words for the homeowner (never blaming the crew).
 */
export interface PlanWarning extends WarningFinding {
  readonly audience: WarningAudience;
}

/** Which seed-rate range a seeding is judged by; winter_overseeding is ryegrass sown into a warm-season lawn for winter color. */
export type SeedRateBasis = "overseeding" | "new_seeding" | "winter_overseeding";

export interface SpeciesSeedSummary {
  readonly species: Species;
  readonly percent: number;
  readonly plsFraction: number;
  readonly bulkLb: number;
  readonly seedsPerSqFt: number | null;
}

export interface SeedSummary {
  readonly rateLbPer1000: number;
  readonly rateGPerM2: number;
  /** Percent-weighted pure live seed of the mix, as a fraction. */
  readonly plsFraction: number;
  readonly plsRateLbPer1000: number;
  readonly bulkSeedLb: number;
  readonly pureLiveSeedLb: number;
  /** Null when seeds per pound are not published for every species in the mix. */
  readonly seedsPerSqFt: number | null;
  readonly expectedRangeLbPer1000: { readonly min: number; readonly max: number; readonly basis: SeedRateBasis };
  readonly perSpecies: readonly SpeciesSeedSummary[];
}

export interface ProductSummary {
  readonly name: string;
  readonly rateLbPer1000: number;
  readonly totalLb: number;
  readonly totalKg: number;
  readonly nutrientsPer1000: NutrientAmounts;
  readonly nutrientsTotal: NutrientAmounts;
}

export interface CalculatorSummary {
  readonly areaFt2: number;
  readonly areaM2: number;
  readonly seed: SeedSummary | null;
  readonly products: readonly ProductSummary[];
  readonly nutrientsPer1000: NutrientAmounts;
  readonly nutrientsTotal: NutrientAmounts;
  readonly precipitationRateInPerHour: number;
  readonly precipitationRateMeasured: boolean;
  /** Where an unmeasured rate comes from: the sprinkler type's typical range, or the program's default. */
  readonly precipitationRateDefault: { readonly basis: "sprinkler_type"; readonly minInPerHour: number; readonly maxInPerHour: number; readonly source: string; readonly provenance: Provenance } | { readonly basis: "program" } | null;
  readonly germinationMinutesPerCycle: number | null;
}

export interface PhaseRange {
  readonly phase: Phase;
  readonly start: IsoDate;
  readonly end: IsoDate;
}

/** Where the visit falls against its work's best window (rules/season.ts). */
export type SeasonVerdict = "in_window" | "early" | "late" | "dormant_seeding";
/** Seeding, winter ryegrass overseeding of a warm-season lawn, or care without seed (aeration, feeding…). */
export type SeasonWork = "seeding" | "winter_overseeding" | "care";
export type SeasonPeriod = "spring" | "summer" | "fall" | "winter";

export interface SeasonCheck {
  readonly verdict: SeasonVerdict;
  readonly work: SeasonWork;
  /** The grass family whose season was judged: the seed's for seeding, the lawn's otherwise. */
  readonly family: "cool" | "warm";
  /** The visit's part of the growing year; null in frost-free places. */
  readonly period: SeasonPeriod | null;
  /** The season's first frost the check used; null in frost-free places. */
  readonly firstFrost: IsoDate | null;
  /** True when no frost date was entered for this season and the hemisphere's default stood in. */
  readonly firstFrostAssumed: boolean;
  /** The work's best window in this season (inclusive), when it has one. */
  readonly window: { readonly start: IsoDate; readonly end: IsoDate } | null;
  /** When the soil is expected to warm for this grass family next spring. */
  readonly soilWarms: IsoDate | null;
  /** Seed lying dormant: the day the plan expects it to start growing. */
  readonly sowingStarts: IsoDate | null;
  /** Cold or frozen ground from this winter to next spring, and the next: no watering (inclusive dates). */
  readonly noWatering: readonly { readonly start: IsoDate; readonly end: IsoDate }[];
  /** The season's feeding cut-off until spring, this year and next: no feeding (inclusive dates). */
  readonly noFeeding: readonly { readonly start: IsoDate; readonly end: IsoDate }[];
}

export interface PlanMeta {
  readonly engineVersion: number;
  readonly programVersion: number;
  /** Hash of the normalised input, to tell whether a stored plan is stale. */
  readonly inputHash: string;
  readonly visitDate: IsoDate;
  readonly timeZone: string;
  readonly hemisphere: Hemisphere;
  readonly seeding: boolean;
  readonly phases: readonly PhaseRange[];
  readonly firstMowDate: IsoDate | null;
  readonly germinationWateringEnds: IsoDate | null;
  readonly planEnds: IsoDate;
  /** The season check; absent on plans stored before engine version 3. */
  readonly season?: SeasonCheck;
  /** Present on recomputed plans: the day the recompute was anchored on. */
  readonly recomputedOn?: IsoDate;
}

export interface Plan {
  readonly meta: PlanMeta;
  readonly prepSteps: readonly PlanStep[];
  readonly steps: readonly PlanStep[];
  readonly holdOffs: readonly HoldOff[];
  readonly warnings: readonly PlanWarning[];
  readonly summary: CalculatorSummary;
  /** Full texts of every caution id used anywhere in the plan. */
  readonly cautions: readonly { readonly id: CautionId; readonly text: string }[];
}
