import { useSyncExternalStore } from "react";
import type { PlanHeader } from "#shared/schemas/plans";
import { useMyPlans } from "../api/get-my-plans.ts";

/** The plan picked on this device, shared by every screen (Today, Plan, Ask, Messages). */
const storageKey = "sproutline.planId";
const listeners = new Set<() => void>();

function readChoice(): number | null {
  try {
    const value = Number(localStorage.getItem(storageKey));
    return Number.isInteger(value) && value > 0 ? value : null;
  } catch {
    return null;
  }
}

let choice = typeof window === "undefined" ? null : readChoice();

export function choosePlan(planId: number) {
  if (planId === choice) return;
  choice = planId;
  try {
    localStorage.setItem(storageKey, String(planId));
  } catch {
    // Storage blocked: the choice still holds until the page reloads.
  }
  listeners.forEach((notify) => notify());
}

function subscribe(notify: () => void) {
  listeners.add(notify);
  return () => listeners.delete(notify);
}

/** The newest active plan is the one whose steps matter today; cancelled ones come last. */
export function defaultPlan(plans: readonly PlanHeader[]): PlanHeader | undefined {
  return [...plans].sort((a, b) => {
    if (a.status !== b.status) return a.status === "active" ? -1 : 1;
    return b.visitDate.localeCompare(a.visitDate);
  })[0];
}

/**
 * The plan to show: the one asked for, else the newest active one. Outside React (a route
 * loader fetching ahead) `wanted` defaults to the choice remembered on this device.
 */
export function selectPlan(plans: readonly PlanHeader[], wanted: number | null = choice): PlanHeader | undefined {
  return plans.find((p) => p.id === wanted) ?? defaultPlan(plans);
}

/**
 * The plans of the signed-in homeowner and the one to show. `overrideId` (from a
 * /plan/:planId address) wins over the remembered choice.
 */
export function useSelectedPlan(overrideId?: number) {
  const plansQuery = useMyPlans();
  const remembered = useSyncExternalStore(subscribe, () => choice, () => null);
  const plans = plansQuery.data ?? [];
  const selected = selectPlan(plans, overrideId ?? remembered);
  return { plansQuery, plans, selected };
}
