import type { VisitFormValues } from "./form-values.ts";

/*
 * The visit schema has no place yet for the day's conditions or a regulated-application
 * record, so both travel inside `notes` as a clearly marked block the server (and a person
 * reading the notes) can pick out. When the API grows real fields, only this file changes.
 */
export const APPLICATION_RECORD_HEADING = "--- Regulated application record ---";
export const CONDITIONS_HEADING = "--- Conditions ---";

function windText(values: VisitFormValues): string | null {
  const { windMph, windDirection } = values.conditions;
  if (windDirection === "calm") return "calm";
  const parts = [windMph.trim() && `${windMph.trim()} mph`, windDirection && windDirection !== "variable" ? `from ${windDirection}` : windDirection].filter(Boolean);
  return parts.length ? parts.join(" ") : null;
}

function temperatureText(values: VisitFormValues): string | null {
  const t = values.conditions.temperatureF.trim();
  return t ? `${t} °F` : null;
}

export function conditionsBlock(values: VisitFormValues): string | null {
  const lines = [temperatureText(values) && `Temperature: ${temperatureText(values)}`, windText(values) && `Wind: ${windText(values)}`].filter(Boolean);
  return lines.length ? [CONDITIONS_HEADING, ...lines].join("\n") : null;
}

export function applicationBlock(values: VisitFormValues): string | null {
  if (!values.regulated) return null;
  const a = values.application;
  const line = (label: string, value: string | null) => `${label}: ${value?.trim() || "—"}`;
  return [
    APPLICATION_RECORD_HEADING,
    line("Product", a.product),
    line("EPA registration no.", a.epaRegistrationNo),
    line("State registration no.", a.stateRegistrationNo),
    line("Rate", a.rate),
    line("Area treated", a.areaTreated),
    line("Target pest", a.target),
    line("Applicator", a.applicatorName),
    line("Applicator licence no.", a.licenceNo),
    line("Wind", windText(values)),
    line("Temperature", temperatureText(values)),
    line("Date", values.visit.date),
  ].join("\n");
}

/** The technician's own notes, then the conditions, then the application record. */
export function composeNotes(values: VisitFormValues): string | undefined {
  const text = [values.notes.trim(), conditionsBlock(values), applicationBlock(values)].filter(Boolean).join("\n\n");
  return text || undefined;
}
