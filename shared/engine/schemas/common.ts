import { z } from "zod";
import { isValidIsoDate, isValidLocalTime } from "../dates.ts";
import { SPECIES } from "../tables/species.ts";
import { isValidTimeZone } from "../zone-time.ts";

/**
 * Dates the product accepts anywhere (visits, frost dates, filters, follow-ups). Wide enough
 * for any real record, narrow enough that PostgreSQL (no year 0), JavaScript dates and the
 * engine's day arithmetic all agree on every accepted value. ISO strings of four-digit years
 * compare like the dates they name, so the check is two string comparisons.
 */
export const EARLIEST_DATE = "1900-01-01";
export const LATEST_DATE = "2199-12-31";
export const DATE_RANGE_MESSAGE = "Use a date from 1900 to 2199";

export const isoDateSchema = z
  .string()
  .refine(isValidIsoDate, { message: "Use a real calendar date written YYYY-MM-DD" })
  .refine((value) => value >= EARLIEST_DATE && value <= LATEST_DATE, { message: DATE_RANGE_MESSAGE });

export const localTimeSchema = z
  .string()
  .refine(isValidLocalTime, { message: "Use a 24-hour time written HH:MM" });

export const speciesSchema = z.enum(SPECIES, { message: `Choose one of: ${SPECIES.join(", ")}` });

export const timeZoneSchema = z
  .string()
  .refine(isValidTimeZone, { message: "Use a valid IANA time zone such as America/New_York" });
