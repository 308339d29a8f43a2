import { parsePlanInput, type FieldErrors, type PlanInputRaw } from "#shared/engine/index";
import { OTHER_TIME_ZONE, type PreviewFormValues } from "./form-values.ts";

export type FormCheck = { ok: true; input: PlanInputRaw } | { ok: false; fields: FieldErrors };

/**
 * Turns the form's text into the engine's input and checks it with the engine's own
 * schema, so the page shows exactly the errors the server would answer with.
 * Text that is not a number gets our own plain message instead of zod's "NaN".
 */
export function checkPreviewForm(values: PreviewFormValues): FormCheck {
  const typingErrors: FieldErrors = {};
  const num = (path: string, text: string | undefined, required: boolean): number | undefined => {
    const trimmed = (text ?? "").trim().replace(/,/g, "");
    if (trimmed === "") {
      if (required) typingErrors[path] = "Fill this in";
      return undefined;
    }
    const value = Number(trimmed);
    if (!Number.isFinite(value)) {
      typingErrors[path] = "Enter a number, such as 4.5";
      return undefined;
    }
    return value;
  };

  // A required number left empty or mistyped comes back undefined: the schema then
  // rejects it, and typingErrors carries the message the person sees.
  const { visit, property } = values;
  const irrigation = property.irrigation;
  const hasSprinkler = irrigation.kind !== "none";
  const input: PlanInputRaw = {
    visit: {
      date: visit.date,
      services: visit.services ?? [],
      seedMix: visit.seedMix.map((row, i) => ({
        species: row.species,
        percent: num(`visit.seedMix.${i}.percent`, row.percent, true) as number,
        purityPct: num(`visit.seedMix.${i}.purityPct`, row.purityPct, true) as number,
        germinationPct: num(`visit.seedMix.${i}.germinationPct`, row.germinationPct, true) as number,
      })),
      seedRateLbPer1000: num("visit.seedRateLbPer1000", visit.seedRateLbPer1000, false),
      areaFt2: num("visit.areaFt2", visit.areaFt2, true) as number,
      products: visit.products.map((row, i) => ({
        name: row.name,
        analysis: {
          n: num(`visit.products.${i}.analysis.n`, row.analysis.n, true) as number,
          p: num(`visit.products.${i}.analysis.p`, row.analysis.p, true) as number,
          k: num(`visit.products.${i}.analysis.k`, row.analysis.k, true) as number,
        },
        rateLbPer1000: num(`visit.products.${i}.rateLbPer1000`, row.rateLbPer1000, true) as number,
        ...(row.quickReleaseN ? { quickReleaseN: true } : {}),
        ...(row.organic ? { organic: true } : {}),
      })),
    },
    property: {
      grassType: {
        species: property.grassType.species ?? [],
        ...(property.grassType.season ? { season: property.grassType.season } : {}),
      },
      lawnCondition: property.lawnCondition,
      ...(property.slope ? { slope: property.slope } : {}),
      ...(property.shade ? { shade: property.shade } : {}),
      // Zones and sprinkler rate mean nothing without a sprinkler; the form keeps them in case it comes back.
      irrigation: {
        kind: irrigation.kind,
        ...(hasSprinkler && irrigation.sprinklerType ? { sprinklerType: irrigation.sprinklerType } : {}),
        ...(hasSprinkler ? { zones: num("property.irrigation.zones", irrigation.zones, false) } : {}),
        ...(hasSprinkler
          ? { precipitationRateInPerHour: num("property.irrigation.precipitationRateInPerHour", irrigation.precipitationRateInPerHour, false) }
          : {}),
      },
      currentMowingHeightIn: num("property.currentMowingHeightIn", property.currentMowingHeightIn, true) as number,
      mowerHighestSettingIn: num("property.mowerHighestSettingIn", property.mowerHighestSettingIn, true) as number,
      mowerSettingStepIn: num("property.mowerSettingStepIn", property.mowerSettingStepIn, false),
      timeZone: property.timeZone === OTHER_TIME_ZONE ? property.timeZoneOther.trim() : property.timeZone,
      ...(property.expectedFirstFrost ? { expectedFirstFrost: property.expectedFirstFrost } : {}),
    },
  };

  const parsed = parsePlanInput(input);
  const fields = { ...(parsed.ok ? {} : parsed.fields), ...typingErrors };
  if (Object.keys(fields).length > 0) return { ok: false, fields };
  return { ok: true, input: withoutUndefined(input) };
}

/** JSON drops undefined anyway; dropping it here keeps the query key equal to the body sent. */
function withoutUndefined<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
