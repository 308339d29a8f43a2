import type { z } from "zod";
import { planInputSchema, type PlanInput } from "./plan-input.ts";

export type FieldErrors = Record<string, string>;
export type ParseResult<T> = { ok: true; value: T } | { ok: false; fields: FieldErrors };

/** Key used for an issue about the whole input rather than one field. */
export const ROOT_FIELD = "_root";

/** Flattens zod issues to "visit.seedMix.0.species" → message, first message per field. */
export function fieldErrorsFrom(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const path = issue.path.map(String).join(".") || ROOT_FIELD;
    if (!(path in fields)) fields[path] = issue.message;
  }
  return fields;
}

/**
 * Validates untrusted input (an API body) and never throws, so the server can
 * answer 400 with field errors.
 */
export function parsePlanInput(raw: unknown): ParseResult<PlanInput> {
  const result = planInputSchema.safeParse(raw);
  return result.success ? { ok: true, value: result.data } : { ok: false, fields: fieldErrorsFrom(result.error) };
}
