import type { PlanContext } from "../context.ts";
import type { PlanWarning, WarningFinding, WarningSeverity } from "../types.ts";
import { WARM_SEASON_HOMEOWNER } from "./warm-season.ts";
import { newLawnWateringForHomeowner } from "./place-rules.ts";
import { SEASON_HOMEOWNER } from "./season-advice.ts";
import { preEmergentHomeownerWording } from "./pre-emergent.ts";

type HomeownerWording = Pick<WarningFinding, "message" | "reason"> & { severity: WarningSeverity };

/*
 * Every finding is for the crew: they chose the seed, the rate and the day. Only the findings
 * below also get a homeowner version, worded as something to do or expect, never as a fault
 * of the work. A finding missing here (e.g. a new rule) stays crew-only, the safe default.
 */
const HOMEOWNER: Partial<Record<string, (ctx: PlanContext, finding: WarningFinding) => HomeownerWording | null>> = {
  frost_too_close: (ctx) => ({
    severity: "caution",
    message: `Frost is expected in about ${ctx.frostDay} days, so your new grass has a short season to grow. Keep up the watering and mowing in your plan so it goes into winter as strong as it can.`,
    reason: "Young grass comes through its first winter better the more it has grown before the first hard frost.",
  }),
  seed_rate_high: () => ({
    severity: "info",
    message: "Your lawn got a generous seeding. Keep watering as planned.",
    reason: "Thick new grass needs the same steady moisture as any new seed; the watering in your plan already allows for it.",
  }),
  seed_rate_low: () => ({
    severity: "info",
    message: "If any spots are still bare about a month from now, send us a photo so we can take a look.",
    reason: "A light seeding can leave a few thin spots that a touch-up fills in.",
  }),
  // Only the ryegrass-for-winter-color case (an "info" finding) tells the homeowner what to expect.
  warm_season_autumn_overseeding: (_ctx, finding) =>
    finding.severity === "info"
      ? {
          severity: "info",
          message: "The ryegrass sown today keeps your lawn green through the winter. It fades out as your summer grass wakes up in spring; that is expected.",
          reason: "Ryegrass grows in the cool months while warm-season grass rests, then gives way to it when the weather warms.",
        }
      : null,
  dormant_lawn_seeded: () => ({
    severity: "info",
    message: "Grass that turns brown in late summer is usually resting, not dead. The watering in your plan helps it green up again.",
    reason: "Lawns go dormant in heat and drought and recover with water.",
  }),
  high_n_quick_release_on_seed: () => ({
    severity: "caution",
    message: "Please don't put down any fertilizer of your own for now: your lawn has been fed, and more could burn the young grass.",
    reason: "Extra nitrogen on new seedlings can burn them and favors leaf growth over roots.",
  }),
  species_rarely_seeded: () => ({
    severity: "info",
    message: "This kind of grass comes up slowly and unevenly from seed, so the dates in your plan are estimates. Keep watering as planned.",
    reason: "Few lawns are grown from this seed, so its sprouting times are rougher than for common grasses.",
  }),
  watering_days_limit_new_lawn: (ctx) => {
    const wording = newLawnWateringForHomeowner(ctx);
    return wording ? { severity: "caution", ...wording } : null;
  },
  pre_emergent_before_seeding: preEmergentHomeownerWording,
  no_sprinkler_for_seed: (_ctx, finding) => ({
    severity: "caution",
    message: "Without a sprinkler the seed has to be kept damp by hand several times a day. A hose-end sprinkler on a timer makes that much easier.",
    reason: finding.reason,
  }),
  ...WARM_SEASON_HOMEOWNER,
  ...SEASON_HOMEOWNER,
};

/** The plan's warnings: every finding for the crew, then the homeowner versions (sources kept). */
export function warningsForAudiences(ctx: PlanContext, findings: readonly WarningFinding[]): PlanWarning[] {
  // One list, crew versions first: runs for every plan, so no intermediate arrays.
  const out: PlanWarning[] = [];
  for (const f of findings) out.push({ ...f, audience: "crew" });
  for (const f of findings) {
    const wording = HOMEOWNER[f.code]?.(ctx, f);
    if (wording) out.push({ code: f.code, ...wording, source: f.source, provenance: f.provenance, audience: "homeowner" });
  }
  return out;
}

/** What a homeowner is shown. Warnings stored before audiences existed count as crew-only. */
export function homeownerWarnings<W extends { audience?: string }>(warnings: readonly W[]): W[] {
  return warnings.filter((w) => w.audience === "homeowner");
}
