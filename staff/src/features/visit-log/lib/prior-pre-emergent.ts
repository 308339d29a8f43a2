import { SEEDING_SERVICES, type PriorPreEmergent } from "#shared/engine/index";
import type { VisitFormValues } from "./form-values.ts";

/** The question about earlier weed preventers is asked when seed goes down, as the plan treats it. */
export function isSeedingVisit(visit: VisitFormValues["visit"]): boolean {
  return visit.seedMix.length > 0 || visit.services.some((s) => SEEDING_SERVICES.includes(s));
}

/**
 * What the visit sends about an earlier weed preventer: only on a seeding visit answered "yes".
 * `require` adds the form's own message for each missing answer (the save checks; live warnings don't).
 */
export function priorPreEmergentBody(
  visit: VisitFormValues["visit"],
  require?: (path: string, message: string) => void,
): Partial<PriorPreEmergent> | undefined {
  const prior = visit.priorPreEmergent;
  if (!prior || prior.answer !== "yes" || !isSeedingVisit(visit)) return undefined;
  if (!prior.product) require?.("visit.priorPreEmergent.product", "Pick what was put down");
  if (!prior.appliedOn) require?.("visit.priorPreEmergent.appliedOn", "Give the date it went down (roughly is fine)");
  return {
    product: prior.product || undefined,
    appliedOn: prior.appliedOn || undefined,
    activeIngredient: prior.activeIngredient || undefined,
  };
}
