import { createContext, use } from "react";
import type { FieldValues, UseFormSetError } from "react-hook-form";
import type { FieldErrors } from "#shared/engine/index";
import { applyServerErrors } from "#shared/ui/index";

/** Every field error on the page by path ("visit.areaFt2"): the client's check first, the server's answer second. */
export const FieldErrorsContext = createContext<FieldErrors>({});

export function useFieldError(path: string): string | undefined {
  return use(FieldErrorsContext)[path];
}

/** The id of the input (or group) for a path, so the error summary can link to it. */
export function fieldId(path: string): string {
  return `plan-preview-${path.replace(/\./g, "-")}`;
}

/** Paths shown on a group of inputs rather than one input. */
export function groupErrorPaths(seedRows: number, productRows: number): string[] {
  return [
    "visit.seedMix",
    "visit.products",
    "property.grassType",
    "property.irrigation",
    ...Array.from({ length: seedRows }, (_, i) => `visit.seedMix.${i}`),
    ...Array.from({ length: productRows }, (_, i) => `visit.products.${i}.analysis`),
  ];
}

/** Every path of the form's values down to the inputs; lists of ticks (services, species) count as one input. */
export function leafPaths(value: unknown, prefix = ""): string[] {
  if (Array.isArray(value) && value.some((item) => typeof item === "object" && item !== null)) {
    return value.flatMap((item, i) => leafPaths(item, `${prefix}.${i}`));
  }
  if (value && typeof value === "object" && !Array.isArray(value)) {
    return Object.entries(value).flatMap(([key, child]) => leafPaths(child, prefix ? `${prefix}.${key}` : key));
  }
  return prefix ? [prefix] : [];
}

/**
 * Places a 400's field messages with the shared applyServerErrors, collecting them
 * into a map instead of calling react-hook-form's setError: the preview runs while
 * someone types, and setError would steal focus from the input they are typing in.
 * Returns the message to show above the form for anything not placed.
 */
export function placeServerErrors(error: unknown, knownPaths: readonly string[]): { fields: FieldErrors; message: string | null } {
  if (!error) return { fields: {}, message: null };
  const fields: FieldErrors = {};
  const collect: UseFormSetError<FieldValues> = (name, fieldError) => {
    fields[name] = fieldError.message ?? "Check this field";
  };
  return { fields, message: applyServerErrors(error, collect, knownPaths) };
}
