import type { PreEmergentIngredient, PriorPreEmergentProduct, Service, Species } from "#shared/engine/index";
import { localToday } from "#shared/ui/index";
import { WIND_DIRECTIONS } from "#shared/schemas/visits";
import { emptyLawnOnSite, type LawnOnSiteValues } from "./lawn-on-site.ts";

/*
 * The form keeps what was typed, as text; it is turned into the API's numbers on save
 * (lib/to-log-visit.ts). Paths mirror the API body ("visit.seedMix.0.percent"), so the
 * server's field errors land on the right inputs without translation — except the regulated
 * record, typed under "application.*" and sent as "applicationRecord" (lib/application-record.ts
 * maps the paths back).
 */
export interface SeedRow {
  species: Species | "";
  percent: string;
  purityPct: string;
  germinationPct: string;
}

export interface ProductRow {
  name: string;
  analysis: { n: string; p: string; k: string };
  rateLbPer1000: string;
  quickReleaseN: boolean;
  /** Organic (natural) fertilizer: suits new seed as a starter does. Absent in drafts kept before it was asked. */
  organic?: boolean;
  /** Only for the live bag count; not part of the visit. */
  bagLb: string;
}

export { WIND_DIRECTIONS };

/**
 * Asked on seeding visits: was a weed preventer put down in the months before? "answer" is the
 * form's own ("" = not answered yet); the rest is sent as visit.priorPreEmergent when it is "yes".
 */
export interface PriorPreEmergentAnswer {
  answer: "" | "no" | "yes" | "unknown";
  product: PriorPreEmergentProduct | "";
  appliedOn: string;
  activeIngredient: PreEmergentIngredient | "";
}

export interface ApplicationRecord {
  product: string;
  epaRegistrationNo: string;
  stateRegistrationNo: string;
  /** The amount, as typed; its unit is `rateUnit`. */
  rate: string;
  rateUnit: string;
  /** In ft². */
  areaTreated: string;
  target: string;
  applicatorName: string;
  licenceNo: string;
}

export interface VisitFormValues {
  propertyId: string;
  visit: {
    date: string;
    services: Service[];
    seedMix: SeedRow[];
    seedRateLbPer1000: string;
    areaFt2: string;
    products: ProductRow[];
    /** A soil test shows the lawn needs phosphorus: places that limit phosphorus accept it as a reason. */
    soilTestCallsForPhosphorus?: boolean;
    /** Absent in drafts kept before the form asked it. */
    priorPreEmergent?: PriorPreEmergentAnswer;
  };
  seedBagLb: string;
  /** The lawn as found today: condition, slope and shade (components/lawn-today.tsx); saved on the lawn's record. */
  lawn: LawnOnSiteValues;
  conditions: { temperatureF: string; windMph: string; windDirection: string };
  notes: string;
  regulated: boolean;
  application: ApplicationRecord;
}

export const emptySeedRow = (): SeedRow => ({ species: "", percent: "", purityPct: "", germinationPct: "" });
export const emptyProductRow = (): ProductRow => ({ name: "", analysis: { n: "", p: "", k: "" }, rateLbPer1000: "", quickReleaseN: false, organic: false, bagLb: "50" });
export const emptyPriorPreEmergent = (): PriorPreEmergentAnswer => ({ answer: "", product: "", appliedOn: "", activeIngredient: "" });
export const emptyApplication = (): ApplicationRecord => ({
  product: "",
  epaRegistrationNo: "",
  stateRegistrationNo: "",
  rate: "",
  rateUnit: "fl oz per 1,000 ft²",
  areaTreated: "",
  target: "",
  applicatorName: "",
  licenceNo: "",
});

export function defaultVisitForm(applicatorName = ""): VisitFormValues {
  return {
    propertyId: "",
    visit: { date: localToday(), services: [], seedMix: [], seedRateLbPer1000: "", areaFt2: "", products: [], priorPreEmergent: emptyPriorPreEmergent() },
    seedBagLb: "50",
    lawn: emptyLawnOnSite(),
    conditions: { temperatureF: "", windMph: "", windDirection: "" },
    notes: "",
    regulated: false,
    application: { ...emptyApplication(), applicatorName },
  };
}

/** "visit.seedMix.0.percent" → "visit-log-visit-seedMix-0-percent": an element id for focusing a field. */
export function fieldId(path: string): string {
  return `visit-log-${path.replace(/\./g, "-")}`;
}
