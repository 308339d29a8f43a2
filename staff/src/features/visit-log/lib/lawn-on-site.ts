import { SHADE_LEVELS, SLOPES, type LawnCondition, type ShadeLevel, type Slope } from "#shared/engine/index";
import type { LawnOnSite } from "#shared/schemas/visits";
import { SHADE_LABELS, SLOPE_LABELS } from "#shared/ui/index";

/** As typed: "" means "not noted", so the lawn keeps what is recorded. */
export interface LawnOnSiteValues {
  lawnCondition: LawnCondition | "";
  slope: Slope | "";
  shade: ShadeLevel | "";
}

export const emptyLawnOnSite = (): LawnOnSiteValues => ({ lawnCondition: "", slope: "", shade: "" });


export const slopeOptions = SLOPES.map((value) => ({ value, label: SLOPE_LABELS[value] }));
export const shadeOptions = SHADE_LEVELS.map((value) => ({ value, label: SHADE_LABELS[value] }));

/** The API's `lawn` part: only what was noted, or nothing. Drafts saved before these fields existed have none. */
export function toLawnOnSite(values: LawnOnSiteValues | undefined): LawnOnSite | undefined {
  const noted = { lawnCondition: values?.lawnCondition || undefined, slope: values?.slope || undefined, shade: values?.shade || undefined };
  const kept = Object.fromEntries(Object.entries(noted).filter(([, v]) => v !== undefined)) as LawnOnSite;
  return Object.keys(kept).length > 0 ? kept : undefined;
}

/** What the lawn's record says, for the "as recorded" choice; unknown values read as not recorded. */
export function recordedLawnOnSite(lawn: Record<string, unknown> | undefined): { slope?: Slope; shade?: ShadeLevel } {
  const slope = (SLOPES as readonly unknown[]).includes(lawn?.slope) ? (lawn?.slope as Slope) : undefined;
  const shade = (SHADE_LEVELS as readonly unknown[]).includes(lawn?.shade) ? (lawn?.shade as ShadeLevel) : undefined;
  return { ...(slope ? { slope } : {}), ...(shade ? { shade } : {}) };
}
