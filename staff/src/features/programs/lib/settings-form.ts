import { programSettingsSchema, type NumericSettingKey, type ProgramSettings } from "#shared/engine/index";
import type { Bound, Bounds } from "../api/get-program.ts";
import type { ProgramSettingsBody } from "../api/save-program.ts";

/** Every setting as typed: numbers stay text until checked, lists are comma-separated. */
export type SettingsFormValues = Record<NumericSettingKey, string> & {
  checkInPhotoDays: string;
  germinationWateringTimes: string;
  deepWateringTime: string;
};
export type SettingsField = keyof SettingsFormValues;
export type SettingsErrors = Partial<Record<SettingsField, string>>;

export const numericKeys = (bounds: Partial<Bounds>) => Object.keys(bounds) as NumericSettingKey[];

export function formValuesOf(settings: ProgramSettings, bounds: Partial<Bounds>): SettingsFormValues {
  const values = {
    checkInPhotoDays: settings.checkInPhotoDays.join(", "),
    germinationWateringTimes: (settings.germinationWateringTimes ?? []).join(", "),
    deepWateringTime: settings.deepWateringTime,
  } as SettingsFormValues;
  for (const key of numericKeys(bounds)) values[key] = String(settings[key]);
  return values;
}

/** The bound's own message, in the same words the engine's schema uses. */
export function checkNumber(text: string, bound: Bound): { value?: number; error?: string } {
  const trimmed = text.trim();
  if (trimmed === "") return { error: "Fill this in" };
  const value = Number(trimmed);
  if (!Number.isFinite(value)) return { error: "Enter a number, such as 14" };
  if (bound.integer && !Number.isInteger(value)) return { error: "Use a whole number" };
  const unit = bound.unit === "count" ? "" : ` ${bound.unit}`;
  if (value < bound.min) return { value, error: `Must be at least ${bound.min}${unit} (safe bound)` };
  if (value > bound.max) return { value, error: `Must be at most ${bound.max}${unit} (safe bound)` };
  return { value };
}

const list = (text: string) =>
  text
    .split(/[,;\s]+/)
    .map((part) => part.trim())
    .filter(Boolean);

export type SettingsCheck = { ok: true; settings: ProgramSettingsBody } | { ok: false; fields: SettingsErrors };

/**
 * Turns the form into the body to save and checks it: first each number against its
 * bound, then the whole with the engine's own schema (which knows, e.g., that the
 * watering times must match the waterings a day).
 */
export function checkSettings(values: SettingsFormValues, bounds: Partial<Bounds>): SettingsCheck {
  const fields: SettingsErrors = {};
  const body: Record<string, unknown> = {};
  for (const key of numericKeys(bounds)) {
    const { value, error } = checkNumber(values[key], bounds[key]!);
    if (error) fields[key] = error;
    body[key] = value;
  }
  const days = list(values.checkInPhotoDays);
  const dayNumbers = days.map(Number);
  if (dayNumbers.some((d) => !Number.isInteger(d))) fields.checkInPhotoDays = "List whole days after the visit, such as 30, 45";
  body.checkInPhotoDays = dayNumbers;
  const times = list(values.germinationWateringTimes);
  if (times.length > 0) body.germinationWateringTimes = times;
  body.deepWateringTime = values.deepWateringTime;

  const parsed = programSettingsSchema.safeParse(body);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = String(issue.path[0]) as SettingsField;
      fields[field] ??= issue.message;
    }
  }
  if (Object.keys(fields).length > 0) return { ok: false, fields };
  return { ok: true, settings: body as ProgramSettingsBody };
}

/** How many settings differ from the version in force, for the save button. */
export function changedFields(values: SettingsFormValues, saved: SettingsFormValues): SettingsField[] {
  return (Object.keys(saved) as SettingsField[]).filter((key) => normalise(values[key]) !== normalise(saved[key]));
}

const normalise = (text: string) => {
  const parts = list(text);
  return parts.map((p) => (Number.isFinite(Number(p)) ? String(Number(p)) : p)).join(",");
};
