import type { z } from "zod";
import type { languageSchema, unitsSchema } from "#shared/schemas/preferences";

export type Language = z.infer<typeof languageSchema>;
export type Units = z.infer<typeof unitsSchema>;

/**
 * The person's saved choice is the truth, but it lives on the server; these local copies let
 * the first screen render in the right language before (or without) that answer, and let
 * the e2e tests pick a language by setting one key.
 */
export const languageStorageKey = "sproutline.language";
export const unitsStorageKey = "sproutline.units";

function readStorage(key: string): string | null {
  try {
    return localStorage.getItem(key);
  } catch {
    return null; // storage blocked (private mode in some browsers): fall back to defaults
  }
}

function writeStorage(key: string, value: string) {
  try {
    localStorage.setItem(key, value);
  } catch {
    // Not fatal: the choice still applies for this visit.
  }
}

export function browserLanguage(): Language {
  const preferred = typeof navigator === "undefined" ? [] : (navigator.languages ?? [navigator.language]);
  return preferred.some((tag) => tag?.toLowerCase().startsWith("es")) ? "es" : "en";
}

export function initialLanguage(): Language {
  const stored = readStorage(languageStorageKey);
  return stored === "es" || stored === "en" ? stored : browserLanguage();
}

export function rememberLanguage(language: Language) {
  writeStorage(languageStorageKey, language);
}

export function storedUnits(): Units {
  return readStorage(unitsStorageKey) === "metric" ? "metric" : "us";
}

export function rememberUnits(units: Units) {
  writeStorage(unitsStorageKey, units);
}
