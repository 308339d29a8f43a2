import { z } from "zod";
import { blackoutWindowSchema, PHOSPHORUS_RULES, placeRulesSchema, wateringDaysSchema } from "../engine/index.ts";
import { recordId } from "./ids.ts";

/** US state (or other region) code as a property's address holds it: two to three letters. */
export const regionCodeSchema = z
  .string()
  .trim()
  .regex(/^[A-Za-z]{2,3}$/, "Use the state's 2-letter code, for example OH")
  .transform((s) => s.toUpperCase());

/** The start of a ZIP code: 3 to 5 digits. */
export const zipPrefixSchema = z.string().trim().regex(/^\d{3,5}$/, "Use 3 to 5 digits of a ZIP code");

/** What a manager saves for one place. */
export const savePlaceSchema = z.object({
  name: placeRulesSchema.shape.name,
  region: regionCodeSchema,
  zipPrefixes: z
    .array(zipPrefixSchema)
    .max(30, "At most 30 ZIP prefixes")
    .default([])
    .refine((list) => new Set(list).size === list.length, { message: "List each ZIP prefix once" }),
  fertilizerBlackouts: z.array(blackoutWindowSchema).max(6, "At most 6 windows").default([]),
  phosphorus: z.enum(PHOSPHORUS_RULES).default("allowed"),
  /** null: the place limits no watering days. */
  watering: wateringDaysSchema.nullable().default(null),
  /** Marks sample data, so no one mistakes it for a real place's rules. */
  isExample: z.boolean().default(false),
});
export type SavePlace = z.output<typeof savePlaceSchema>;
export type SavePlaceInput = z.input<typeof savePlaceSchema>;

export const placeSchema = savePlaceSchema.extend({
  id: z.number().int(),
  updatedAt: z.string(),
});
export type Place = z.output<typeof placeSchema>;

export const placeListSchema = z.object({ places: z.array(placeSchema) });
export const placeIdParamsSchema = z.object({ id: recordId });
