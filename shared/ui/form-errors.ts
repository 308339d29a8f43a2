import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { errorMessage, isApiRequestError } from "./api-client.ts";

/**
 * Puts the server's per-field messages onto the matching inputs.
 * Returns the message to show above the form when the error isn't about a known field
 * (rate limits, network trouble, a field this form doesn't have), or null when all were placed.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!isApiRequestError(error)) return errorMessage(error);
  let placed = 0;
  let unplaced = false;
  for (const [field, message] of Object.entries(error.fields)) {
    const name = fieldNames.find((known) => known === field);
    if (name) {
      setError(name, { type: "server", message }, { shouldFocus: placed === 0 });
      placed += 1;
    } else {
      unplaced = true;
    }
  }
  return placed > 0 && !unplaced ? null : error.message;
}
