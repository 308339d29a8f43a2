import type { ChosenLawn } from "./chosen-lawn.ts";
import { emptyApplication, emptyPriorPreEmergent, type VisitFormValues } from "./form-values.ts";

/*
 * A visit half-logged on a phone survives a closed tab, a lock screen or a dead signal:
 * the form is kept on this device until it is saved or the technician starts over.
 */
const KEY = "sproutline.staff.visit-log.draft.v1";

export interface VisitDraft {
  values: VisitFormValues;
  lawn: ChosenLawn | null;
  savedAt: string;
}

export function loadDraft(): VisitDraft | null {
  try {
    const raw = localStorage.getItem(KEY);
    if (!raw) return null;
    const draft = JSON.parse(raw) as VisitDraft;
    if (!draft || typeof draft !== "object" || !draft.values?.visit) return null;
    // A draft kept by an older version of the form may lack fields added since.
    draft.values.application = { ...emptyApplication(), ...draft.values.application };
    draft.values.visit.priorPreEmergent = { ...emptyPriorPreEmergent(), ...draft.values.visit.priorPreEmergent };
    return draft;
  } catch {
    return null;
  }
}

export function saveDraft(values: VisitFormValues, lawn: ChosenLawn | null): void {
  try {
    localStorage.setItem(KEY, JSON.stringify({ values, lawn, savedAt: new Date().toISOString() } satisfies VisitDraft));
  } catch {
    // Private mode or a full disk: the form still works, it just won't survive a reload.
  }
}

export function clearDraft(): void {
  try {
    localStorage.removeItem(KEY);
  } catch {
    // Nothing to clear.
  }
}
