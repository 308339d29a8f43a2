import type { LogVisit } from "#shared/schemas/visits";

/*
 * The day's conditions and the regulated-application record travel as their own fields of the
 * API body (`conditions`, `applicationRecord`), no longer inside the notes. The form types the
 * record under "application.*" and wind and temperature once, under "conditions.*"; the API's
 * field errors are mapped back onto those inputs here.
 */

type Conditions = NonNullable<LogVisit["conditions"]>;
type AppRecord = NonNullable<LogVisit["applicationRecord"]>;

const RECORD_TO_FORM: { [K in keyof AppRecord]-?: string } = {
  product: "application.product",
  epaRegistrationNumber: "application.epaRegistrationNo",
  stateRegistrationNumber: "application.stateRegistrationNo",
  rate: "application.rate",
  areaTreated: "application.areaTreated",
  targetPest: "application.target",
  applicatorName: "application.applicatorName",
  applicatorLicenceNumber: "application.licenceNo",
  windMph: "conditions.windMph",
  windDirection: "conditions.windDirection",
  temperatureF: "conditions.temperatureF",
  appliedAt: "visit.date",
};

/** "applicationRecord.rate.unit" → "application.rateUnit"; any other path is the form's already. */
export function formPathOf(apiPath: string): string {
  const match = /^applicationRecord(?:\.([^.]+)(?:\.(.+))?)?$/.exec(apiPath);
  if (!match) return apiPath;
  const [, field, rest] = match;
  if (!field) return "application.product";
  if (field === "rate" && rest === "unit") return "application.rateUnit";
  return RECORD_TO_FORM[field as keyof AppRecord] ?? `application.${field}`;
}

/** Field errors keyed by API path, re-keyed by form path (the first message per input wins). */
export function toFormFields(fields: { [path: string]: string }): { [path: string]: string } {
  const out: { [path: string]: string } = {};
  for (const [path, message] of Object.entries(fields)) {
    const formPath = formPathOf(path);
    if (!(formPath in out)) out[formPath] = message;
  }
  return out;
}

/** Drops the keys nobody filled in; undefined when nothing is left. */
export function compact<T extends object>(value: T): T | undefined {
  const entries = Object.entries(value).filter(([, v]) => v !== undefined && v !== "");
  return entries.length ? (Object.fromEntries(entries) as T) : undefined;
}

export type { Conditions as VisitConditionsBody, AppRecord as ApplicationRecordBody };
