import { savePlaceSchema, type Place, type SavePlace, type SavePlaceInput } from "#shared/schemas/place-rules";

/** A blackout window as the form edits it: month picked from a list, day typed. */
export interface BlackoutValues {
  fromMonth: string;
  fromDay: string;
  toMonth: string;
  toDay: string;
}

export interface PlaceFormValues {
  name: string;
  region: string;
  /** ZIP prefixes separated by commas or spaces. */
  zipText: string;
  blackouts: BlackoutValues[];
  phosphorus: "allowed" | "needs_reason";
  limitWatering: boolean;
  /** Ticked weekdays, "0" = Sunday. */
  weekdays: string[];
  exemptDays: string;
  isExample: boolean;
}

/** Errors keyed by the body's field paths ("fertilizerBlackouts.0.from"), as the server names them too. */
export type PlaceErrors = Record<string, string>;

export const emptyPlace: PlaceFormValues = {
  name: "",
  region: "",
  zipText: "",
  blackouts: [],
  phosphorus: "allowed",
  limitWatering: false,
  weekdays: [],
  exemptDays: "0",
  isExample: false,
};

const splitMonthDay = (md: string) => ({ month: String(Number(md.slice(0, 2))), day: String(Number(md.slice(3, 5))) });
const pad2 = (s: string) => s.trim().padStart(2, "0");

export function formValuesOf(place: Place): PlaceFormValues {
  return {
    name: place.name,
    region: place.region,
    zipText: place.zipPrefixes.join(", "),
    blackouts: place.fertilizerBlackouts.map((w) => {
      const from = splitMonthDay(w.from);
      const to = splitMonthDay(w.to);
      return { fromMonth: from.month, fromDay: from.day, toMonth: to.month, toDay: to.day };
    }),
    phosphorus: place.phosphorus,
    limitWatering: place.watering !== null,
    weekdays: (place.watering?.allowedWeekdays ?? []).map(String),
    exemptDays: String(place.watering?.newLawnExemptDays ?? 0),
    isExample: place.isExample,
  };
}

export function bodyOf(values: PlaceFormValues): SavePlaceInput {
  return {
    name: values.name,
    region: values.region,
    zipPrefixes: values.zipText.split(/[\s,;]+/).filter(Boolean),
    fertilizerBlackouts: values.blackouts.map((w) => ({ from: `${pad2(w.fromMonth)}-${pad2(w.fromDay)}`, to: `${pad2(w.toMonth)}-${pad2(w.toDay)}` })),
    phosphorus: values.phosphorus,
    watering: values.limitWatering
      ? { allowedWeekdays: values.weekdays.map(Number).sort((a, b) => a - b), newLawnExemptDays: values.exemptDays.trim() === "" ? 0 : Number(values.exemptDays) }
      : null,
    isExample: values.isExample,
  };
}

export type PlaceCheck = { ok: true; place: SavePlace } | { ok: false; errors: PlaceErrors };

/** The same rules the server applies, so mistakes show as they are made. */
export function checkPlace(values: PlaceFormValues): PlaceCheck {
  const parsed = savePlaceSchema.safeParse(bodyOf(values));
  if (parsed.success) return { ok: true, place: parsed.data };
  const errors: PlaceErrors = {};
  for (const issue of parsed.error.issues) {
    const path = issue.path.map(String).join(".");
    if (!(path in errors)) errors[path] = issue.message;
  }
  return { ok: false, errors };
}

/** The first error at or under a path: "zipPrefixes" finds "zipPrefixes.2". */
export function errorAt(errors: PlaceErrors, path: string): string | undefined {
  if (errors[path]) return errors[path];
  const key = Object.keys(errors).find((k) => k.startsWith(`${path}.`));
  return key ? errors[key] : undefined;
}
