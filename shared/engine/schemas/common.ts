import { z } from "zod";
import { isValidIsoDate, isValidLocalTime } from "../dates.ts";
import { SPECIES } from "../tables/species.ts";
import { isValidTimeZone } from "../zone-time.ts";

export const isoDateSchema = z
  .string()
  .refine(isValidIsoDate, { message: "Use a real calendar date written YYYY-MM-DD" });

export const localTimeSchema = z
  .string()
  .refine(isValidLocalTime, { message: "Use a 24-hour time written HH:MM" });

export const speciesSchema = z.enum(SPECIES, { message: `Choose one of: ${SPECIES.join(", ")}` });

export const timeZoneSchema = z
  .string()
  .refine(isValidTimeZone, { message: "Use a valid IANA time zone such as America/New_York" });
