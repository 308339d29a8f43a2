import {
  isValidTimeZone, LAWN_CONDITIONS, SERVICES, SHADE_LEVELS, SLOPES, SPECIES, SPRINKLER_TYPES,
  type PlanInputRaw, type ShadeLevel, type Slope, type SprinklerType,
} from "#shared/engine/index";
import type { ImportColumn } from "#shared/schemas/visit-import";
import { z } from "zod";
import { parseContact } from "../auth/contact.ts";
import { readCellDate } from "./cell-dates.ts";

const emailSchema = z.email();

/**
 * Turns one CSV row into the shapes the app stores, or says which cells are wrong. Pure:
 * matching against the database and the engine's own checks happen in the service.
 */
export type RowErrors = Partial<Record<ImportColumn | "row", string>>;

export type LawnFacts = {
  grassType?: { species: string[] };
  lawnCondition?: string;
  slope?: Slope;
  shade?: ShadeLevel;
  irrigation?: { kind: string; sprinklerType?: SprinklerType; precipitationRateInPerHour?: number };
  currentMowingHeightIn?: number;
  mowerHighestSettingIn?: number;
  expectedFirstFrost?: string;
};

export type MappedRow = {
  customerRef: string;
  firstName: string | null;
  lastName: string | null;
  email: string | null;
  phone: string | null;
  street: string;
  town: string | null;
  region: string | null;
  postalCode: string | null;
  timeZone: string;
  visit: PlanInputRaw["visit"] & { date: string; services: string[]; areaFt2: number };
  /** Only the lawn facts the row gives; blank cells keep what a known lawn already has. */
  lawn: LawnFacts;
  technicianEmail: string | null;
  notes: string | null;
};

const IRRIGATION_KINDS = ["in_ground", "hose_end", "none"];

/** A CSV row whose cells are all blank (a trailing line from a spreadsheet). */
export const isBlankRow = (record: Record<string, string | undefined>) => Object.values(record).every((v) => !v?.trim());

class CellReader {
  readonly errors: RowErrors = {};
  constructor(private readonly record: Record<string, string | undefined>) {}

  text(column: ImportColumn, max = 200): string | null {
    const value = (this.record[column] ?? "").trim();
    if (!value) return null;
    // Never passed on: PostgreSQL text cannot hold NUL.
    if (value.includes("\0")) {
      this.errors[column] = "Contains the NUL character (\\u0000); retype the cell";
      return null;
    }
    if (value.length > max) {
      this.errors[column] = `Keep it under ${max} characters`;
      return null;
    }
    return value;
  }

  required(column: ImportColumn, max = 200): string {
    const value = this.text(column, max);
    if (value === null && !this.errors[column]) this.errors[column] = "Required";
    return value ?? "";
  }

  number(column: ImportColumn): number | undefined {
    const value = this.text(column, 40);
    if (value === null) return undefined;
    const n = readNumber(value);
    if (n === undefined) this.errors[column] = `"${value}" is not a number`;
    return n;
  }

  list(column: ImportColumn): string[] {
    const value = this.text(column, 400);
    return value === null ? [] : value.split(";").map((v) => v.trim()).filter(Boolean);
  }

  numberList(column: ImportColumn): number[] | undefined {
    const values = this.list(column);
    const numbers = values.map(readNumber);
    if (numbers.some((n) => n === undefined)) {
      this.errors[column] = `Use numbers separated by ";"`;
      return undefined;
    }
    return numbers as number[];
  }

  oneOf(column: ImportColumn, allowed: readonly string[]): string | undefined {
    const value = this.text(column, 60);
    if (value === null) return undefined;
    const normalised = value.toLowerCase().replace(/[\s-]+/g, "_");
    if (!allowed.includes(normalised)) {
      this.errors[column] = `Use one of: ${allowed.join(", ")}`;
      return undefined;
    }
    return normalised;
  }

  date(column: ImportColumn): string | undefined {
    const value = this.text(column, 30);
    if (value === null) return undefined;
    const read = readCellDate(value);
    if ("error" in read) {
      this.errors[column] = read.error;
      return undefined;
    }
    return read.date;
  }
}

/** "6000", "6,000", "4.5": plain decimal numbers, thousands commas allowed. */
function readNumber(text: string): number | undefined {
  if (!/^-?(\d{1,3}(,\d{3})+|\d+)?(\.\d+)?$/.test(text) || text === "" || text === "-") return undefined;
  const n = Number(text.replace(/,/g, ""));
  return Number.isFinite(n) ? n : undefined;
}

/** One value per species, or one value that applies to every species. */
function perSpecies(reader: CellReader, column: ImportColumn, values: number[] | undefined, count: number, fallback?: number): number[] | undefined {
  if (values === undefined) return undefined;
  if (values.length === 0) {
    if (fallback !== undefined) return Array(count).fill(fallback);
    if (count > 0) reader.errors[column] = "Required when seed_species is given";
    return undefined;
  }
  if (values.length === 1) return Array(count).fill(values[0]);
  if (values.length !== count) {
    reader.errors[column] = `Give ${count} values (one per species in seed_species) or one for all`;
    return undefined;
  }
  return values;
}

function readSeedMix(reader: CellReader) {
  const species = reader.list("seed_species").map((s) => s.toLowerCase().replace(/[\s-]+/g, "_"));
  const unknown = species.filter((s) => !(SPECIES as readonly string[]).includes(s));
  if (unknown.length) reader.errors.seed_species = `Unknown species ${unknown.join(", ")}; use ${SPECIES.join(", ")}`;
  const n = species.length;
  // A single species is the whole mix unless the file says otherwise.
  const percent = perSpecies(reader, "seed_percent", reader.numberList("seed_percent"), n, n === 1 ? 100 : undefined);
  const purity = perSpecies(reader, "seed_purity_pct", reader.numberList("seed_purity_pct"), n);
  const germination = perSpecies(reader, "seed_germination_pct", reader.numberList("seed_germination_pct"), n);
  if (n === 0 || unknown.length || !percent || !purity || !germination) return [];
  return species.map((s, i) => ({ species: s, percent: percent[i]!, purityPct: purity[i]!, germinationPct: germination[i]! }));
}

function readProducts(reader: CellReader) {
  const name = reader.text("product_name", 120);
  const n = reader.number("product_n");
  const p = reader.number("product_p");
  const k = reader.number("product_k");
  const rate = reader.number("product_rate_lb_per_1000");
  const given = [name, n, p, k, rate].filter((v) => v !== null && v !== undefined).length;
  if (given === 0) return [];
  if (name === null) reader.errors.product_name ??= "Name the product (or leave every product column blank)";
  for (const [column, value] of [["product_n", n], ["product_p", p], ["product_k", k], ["product_rate_lb_per_1000", rate]] as const) {
    if (value === undefined) reader.errors[column] ??= "Required when a product is given";
  }
  if (name === null || n === undefined || p === undefined || k === undefined || rate === undefined) return [];
  return [{ name, analysis: { n, p, k }, rateLbPer1000: rate }];
}

function readLawn(reader: CellReader): LawnFacts {
  const lawn: LawnFacts = {};
  const grass = reader.list("grass_species").map((s) => s.toLowerCase().replace(/[\s-]+/g, "_"));
  const unknownGrass = grass.filter((s) => !(SPECIES as readonly string[]).includes(s));
  if (unknownGrass.length) reader.errors.grass_species = `Unknown species ${unknownGrass.join(", ")}; use ${SPECIES.join(", ")}`;
  else if (grass.length) lawn.grassType = { species: grass };
  const condition = reader.oneOf("lawn_condition", LAWN_CONDITIONS);
  if (condition) lawn.lawnCondition = condition;
  const slope = reader.oneOf("slope", SLOPES) as Slope | undefined;
  if (slope) lawn.slope = slope;
  const shade = reader.oneOf("shade", SHADE_LEVELS) as ShadeLevel | undefined;
  if (shade) lawn.shade = shade;
  const irrigation = reader.oneOf("irrigation", IRRIGATION_KINDS);
  const sprinkler = reader.oneOf("sprinkler_type", SPRINKLER_TYPES) as SprinklerType | undefined;
  const rate = reader.number("precipitation_rate_in_per_h");
  if (irrigation) {
    lawn.irrigation = { kind: irrigation, ...(sprinkler && { sprinklerType: sprinkler }), ...(rate !== undefined && { precipitationRateInPerHour: rate }) };
    if (irrigation === "none" && sprinkler) reader.errors.sprinkler_type = "A lawn without irrigation has no sprinkler: leave it blank, or give the irrigation kind";
  } else if (rate !== undefined) reader.errors.irrigation = "Give the irrigation kind with a precipitation rate";
  // The irrigation is stored as one piece, so a sprinkler type alone would drop the kind a known lawn has.
  else if (sprinkler) reader.errors.irrigation = "Give the irrigation kind with a sprinkler type";
  const height = reader.number("mowing_height_in");
  if (height !== undefined) lawn.currentMowingHeightIn = height;
  const highest = reader.number("mower_highest_in");
  if (highest !== undefined) lawn.mowerHighestSettingIn = highest;
  const frost = reader.date("expected_first_frost");
  if (frost) lawn.expectedFirstFrost = frost;
  return lawn;
}

export function mapRow(record: Record<string, string | undefined>, defaultTimeZone: string): { row: MappedRow; errors: RowErrors } {
  const reader = new CellReader(record);
  const customerRef = reader.required("customer_ref", 64);

  const rawEmail = reader.text("email", 254);
  const email = rawEmail === null ? null : emailSchema.safeParse(rawEmail).success ? rawEmail.toLowerCase() : null;
  if (rawEmail !== null && email === null) reader.errors.email = "Not a valid e-mail address";
  const rawPhone = reader.text("phone", 40);
  // Stored in E.164 like the sign-in flow does, so the homeowner can sign in with this number.
  const phone = rawPhone === null ? null : (parseContact(rawPhone)?.phone ?? null);
  if (rawPhone !== null && phone === null) reader.errors.phone = "Not a valid phone number (add the country code outside North America)";

  const timeZone = reader.text("time_zone", 60) ?? defaultTimeZone;
  if (!isValidTimeZone(timeZone)) reader.errors.time_zone = "Use an IANA time zone such as America/New_York";

  const services = reader.list("services").map((s) => s.toLowerCase().replace(/[\s-]+/g, "_"));
  const unknownServices = services.filter((s) => !(SERVICES as readonly string[]).includes(s));
  if (services.length === 0) reader.errors.services = "Required: services separated by \";\"";
  else if (unknownServices.length) reader.errors.services = `Unknown service ${unknownServices.join(", ")}; use ${SERVICES.join(", ")}`;

  const date = reader.date("visit_date");
  if (date === undefined && !reader.errors.visit_date) reader.errors.visit_date = "Required";
  const areaFt2 = reader.number("area_ft2");
  if (areaFt2 === undefined && !reader.errors.area_ft2) reader.errors.area_ft2 = "Required";
  const seedRate = reader.number("seed_rate_lb_per_1000");

  const technicianEmail = reader.text("technician_email", 254)?.toLowerCase() ?? null;

  const row: MappedRow = {
    customerRef,
    firstName: reader.text("first_name", 80),
    lastName: reader.text("last_name", 80),
    email,
    phone,
    street: reader.required("street", 200),
    town: reader.text("town", 120),
    region: reader.text("region", 60),
    postalCode: reader.text("postal_code", 20),
    timeZone,
    visit: {
      date: date ?? "",
      services,
      seedMix: readSeedMix(reader),
      ...(seedRate !== undefined && { seedRateLbPer1000: seedRate }),
      areaFt2: areaFt2 ?? 0,
      products: readProducts(reader),
    } as MappedRow["visit"],
    lawn: readLawn(reader),
    technicianEmail,
    notes: reader.text("notes", 4000),
  };
  return { row, errors: reader.errors };
}

/** What a new customer and a new lawn need beyond what every row needs. */
export function newCustomerErrors(row: MappedRow): RowErrors {
  const errors: RowErrors = {};
  if (!row.firstName) errors.first_name = "Required for a new customer";
  if (!row.lastName) errors.last_name = "Required for a new customer";
  if (!row.email && !row.phone) errors.email = "Give an e-mail address or a phone number for a new customer";
  return errors;
}

export function newPropertyErrors(row: MappedRow): RowErrors {
  const errors: RowErrors = {};
  if (!row.town) errors.town = "Required for a new property";
  if (!row.region) errors.region = "Required for a new property";
  if (!row.postalCode) errors.postal_code = "Required for a new property";
  return errors;
}

/** The engine names fields by their place in its input; the person fixing the file needs the column. */
const engineFieldColumns: [RegExp, ImportColumn][] = [
  [/^visit\.date/, "visit_date"],
  [/^visit\.services/, "services"],
  [/^visit\.seedMix\.\d+\.percent/, "seed_percent"],
  [/^visit\.seedMix\.\d+\.purityPct/, "seed_purity_pct"],
  [/^visit\.seedMix\.\d+\.germinationPct/, "seed_germination_pct"],
  [/^visit\.seedMix/, "seed_species"],
  [/^visit\.seedRateLbPer1000/, "seed_rate_lb_per_1000"],
  [/^visit\.areaFt2/, "area_ft2"],
  [/^visit\.products\.\d+\.name/, "product_name"],
  [/^visit\.products\.\d+\.analysis\.p/, "product_p"],
  [/^visit\.products\.\d+\.analysis\.k/, "product_k"],
  [/^visit\.products\.\d+\.analysis/, "product_n"],
  [/^visit\.products/, "product_rate_lb_per_1000"],
  [/^property\.grassType/, "grass_species"],
  [/^property\.lawnCondition/, "lawn_condition"],
  [/^property\.slope/, "slope"],
  [/^property\.shade/, "shade"],
  [/^property\.irrigation\.precipitationRateInPerHour/, "precipitation_rate_in_per_h"],
  [/^property\.irrigation\.sprinklerType/, "sprinkler_type"],
  [/^property\.irrigation/, "irrigation"],
  [/^property\.currentMowingHeightIn/, "mowing_height_in"],
  [/^property\.mowerHighestSettingIn/, "mower_highest_in"],
  [/^property\.mowerSettingStepIn/, "mower_highest_in"],
  [/^property\.timeZone/, "time_zone"],
  [/^property\.expectedFirstFrost/, "expected_first_frost"],
];

export function engineErrorsToColumns(fields: Record<string, string>): RowErrors {
  const errors: RowErrors = {};
  for (const [path, message] of Object.entries(fields)) {
    const column = engineFieldColumns.find(([pattern]) => pattern.test(path))?.[1] ?? "row";
    errors[column] ??= column === "row" ? `${path}: ${message}` : message;
  }
  return errors;
}
