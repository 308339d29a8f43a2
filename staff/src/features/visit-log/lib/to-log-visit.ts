import { SEED_MIX_SUM_TOLERANCE } from "#shared/engine/index";
import { logVisitSchema, type LogVisit } from "#shared/schemas/visits";
import { compact, toFormFields, type ApplicationRecordBody, type VisitConditionsBody } from "./application-record.ts";
import type { VisitFormValues } from "./form-values.ts";
import { toLawnOnSite } from "./lawn-on-site.ts";
import { parseNumber } from "./numbers.ts";
import { priorPreEmergentBody } from "./prior-pre-emergent.ts";

export type FormFieldErrors = Record<string, string>;
export type CheckedVisit = { ok: true; body: LogVisit } | { ok: false; fields: FormFieldErrors };

const NOTES_MAX = 4000;

/**
 * Turns the typed form into the API body and checks it with the API's own schema, so the
 * messages on screen are the ones the server would send. Our own checks come first for
 * what the schema can't say well (an empty box, "abc" in a number box, the regulated record).
 */
export function checkVisitForm(values: VisitFormValues): CheckedVisit {
  const fields: FormFieldErrors = {};
  const number = (path: string, text: string, required: boolean): number | undefined => {
    const n = parseNumber(text);
    if (n === null) {
      if (required) fields[path] = "Fill this in";
      return undefined;
    }
    if (Number.isNaN(n)) {
      fields[path] = "Enter a number";
      return undefined;
    }
    return n;
  };
  const text = (path: string, value: string, message: string) => {
    if (!value.trim()) fields[path] = message;
  };

  if (!values.propertyId) fields.propertyId = "Pick the customer's lawn";
  const v = values.visit;
  const seedMix = v.seedMix.map((row, i) => {
    if (!row.species) fields[`visit.seedMix.${i}.species`] = "Pick a species";
    return {
      species: row.species,
      percent: number(`visit.seedMix.${i}.percent`, row.percent, true),
      purityPct: number(`visit.seedMix.${i}.purityPct`, row.purityPct, true),
      germinationPct: number(`visit.seedMix.${i}.germinationPct`, row.germinationPct, true),
    };
  });
  // The schema checks the sum only once every line is valid; say it as soon as the shares are in.
  const shares = seedMix.map((row) => row.percent);
  if (shares.length > 0 && shares.every((n) => n !== undefined)) {
    const total = shares.reduce((sum: number, n) => sum + (n ?? 0), 0);
    if (Math.abs(total - 100) > SEED_MIX_SUM_TOLERANCE) fields["visit.seedMix"] = `The shares add up to ${Math.round(total * 10) / 10} %, not 100 %`;
  }
  const products = v.products.map((row, i) => ({
    name: row.name,
    analysis: {
      n: number(`visit.products.${i}.analysis.n`, row.analysis.n, true),
      p: number(`visit.products.${i}.analysis.p`, row.analysis.p, true),
      k: number(`visit.products.${i}.analysis.k`, row.analysis.k, true),
    },
    rateLbPer1000: number(`visit.products.${i}.rateLbPer1000`, row.rateLbPer1000, true),
    quickReleaseN: row.quickReleaseN,
    organic: row.organic || undefined,
  }));
  const priorPreEmergent = priorPreEmergentBody(v, (path, message) => {
    fields[path] = message;
  });
  const regulated = values.regulated;
  const c = values.conditions;
  const calm = c.windDirection === "calm";
  const temperatureF = number("conditions.temperatureF", c.temperatureF, regulated);
  const typedWind = number("conditions.windMph", c.windMph, regulated && !calm);
  const windMph = typedWind ?? (calm ? 0 : undefined);
  const windDirection = (c.windDirection || undefined) as VisitConditionsBody["windDirection"];
  const conditions = compact<VisitConditionsBody>({ temperatureF, windMph: typedWind, windDirection });

  let applicationRecord: ApplicationRecordBody | undefined;
  if (regulated) {
    if (!c.windDirection) fields["conditions.windDirection"] = "Pick the wind direction";
    const a = values.application;
    text("application.product", a.product, "Name the product applied");
    if (!a.epaRegistrationNo.trim() && !a.stateRegistrationNo.trim()) fields["application.epaRegistrationNo"] = "Give the EPA or the state registration number";
    const rate = number("application.rate", a.rate, true);
    text("application.rateUnit", a.rateUnit, "Give the unit of the rate");
    const areaTreated = number("application.areaTreated", a.areaTreated, true);
    text("application.target", a.target, "Name the target pest or weed");
    text("application.applicatorName", a.applicatorName, "Name the applicator");
    text("application.licenceNo", a.licenceNo, "Give the applicator's licence number");
    applicationRecord = {
      product: a.product.trim(),
      epaRegistrationNumber: a.epaRegistrationNo.trim() || undefined,
      stateRegistrationNumber: a.stateRegistrationNo.trim() || undefined,
      rate: { amount: rate as number, unit: a.rateUnit.trim() },
      areaTreated: areaTreated as number,
      targetPest: a.target.trim(),
      applicatorName: a.applicatorName.trim(),
      applicatorLicenceNumber: a.licenceNo.trim(),
      windMph,
      windDirection,
      temperatureF,
    };
  }
  const notes = values.notes.trim() || undefined;
  if ((notes?.length ?? 0) > NOTES_MAX) fields.notes = `Keep the notes under ${NOTES_MAX.toLocaleString("en-US")} characters`;

  const raw = {
    propertyId: Number(values.propertyId) || undefined,
    visit: {
      date: v.date,
      services: v.services,
      seedMix,
      seedRateLbPer1000: number("visit.seedRateLbPer1000", v.seedRateLbPer1000, false),
      areaFt2: number("visit.areaFt2", v.areaFt2, true),
      products,
      ...(v.soilTestCallsForPhosphorus ? { soilTestCallsForPhosphorus: true } : {}),
      priorPreEmergent,
    },
    lawn: toLawnOnSite(values.lawn),
    conditions,
    applicationRecord,
    notes,
  };

  const parsed = logVisitSchema.safeParse(raw);
  if (!parsed.success) {
    const schemaFields: FormFieldErrors = {};
    for (const issue of parsed.error.issues) {
      const path = issue.path.map(String).join(".");
      if (path && !(path in schemaFields)) schemaFields[path] = issue.message;
    }
    // The schema speaks of "applicationRecord.*"; the form's inputs are "application.*".
    for (const [path, message] of Object.entries(toFormFields(schemaFields))) {
      // Our own message for the same box is the clearer one (e.g. "Fill this in" over "expected number").
      if (path && !(path in fields) && !hasChildError(fields, path)) fields[path] = message;
    }
  }
  return Object.keys(fields).length === 0 ? { ok: true, body: raw as LogVisit } : { ok: false, fields };
}

/** "visit.seedMix.0" when "visit.seedMix.0.percent" already has a message: don't say it twice. */
function hasChildError(fields: FormFieldErrors, path: string): boolean {
  return Object.keys(fields).some((key) => key.startsWith(`${path}.`));
}
