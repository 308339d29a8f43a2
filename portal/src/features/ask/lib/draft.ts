/** The unsent question, per plan, for this browser tab only (sessionStorage: gone when the tab closes). */
const draftKey = (planId: number) => `sproutline.askDraft.${planId}`;

export function readDraft(planId: number): string | null {
  try {
    return sessionStorage.getItem(draftKey(planId));
  } catch {
    return null;
  }
}

export function saveDraft(planId: number, text: string) {
  try {
    if (text) sessionStorage.setItem(draftKey(planId), text);
    else sessionStorage.removeItem(draftKey(planId));
  } catch {
    // Storage full or blocked: the text is still in the form.
  }
}

export function clearDraft(planId: number) {
  saveDraft(planId, "");
}
