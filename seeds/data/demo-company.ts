/**
 * Demo data: an invented company in an invented town. Addresses use the fictional
 * 555-01xx telephone range and the reserved .example domain (RFC 2606).
 */
export const demoCompany = {
  slug: "cobblefield",
  name: "Cobblefield Turf Care",
  time_zone: "America/New_York",
  sms_sender_name: "Cobblefield Turf",
  answer_target_hours: 24,
  // The office line homeowners tap to call or text.
  phone: "+13305550100",
};

export const demoTown = { town: "Wrenmoor", region: "OH", time_zone: "America/New_York" };

export const demoStaff = [
  { role: "manager", name: "Dana Whitlow", email: "dana@cobblefield.example", phone: "+13305550101" },
  { role: "technician", name: "Marco Ibsen", email: "marco@cobblefield.example", phone: "+13305550102" },
  { role: "technician", name: "Priya Lanford", email: "priya@cobblefield.example", phone: "+13305550103" },
] as const;

type DemoCustomer = {
  ref: string;
  firstName: string;
  lastName: string;
  email: string | null;
  phone: string | null;
  street: string;
  postalCode: string;
  lawnAreaFt2: number;
  lawn: Record<string, unknown>;
};

/** The care-plan engine's property facts (its timeZone comes from the property row). */
const coolSeasonLawn = (overrides: Record<string, unknown> = {}) => ({
  grassType: { species: ["tall_fescue"] },
  lawnCondition: "thin",
  irrigation: { kind: "in_ground", zones: 4, precipitationRateInPerHour: 1.5 },
  currentMowingHeightIn: 4,
  mowerHighestSettingIn: 4,
  mowerSettingStepIn: 0.5,
  ...overrides,
});

export const demoCustomers: DemoCustomer[] = [
  { ref: "C-1001", firstName: "Ruth", lastName: "Okonkwo", email: "ruth.okonkwo@mail.example", phone: "+13305550111", street: "14 Larkspur Lane", postalCode: "44990", lawnAreaFt2: 6000, lawn: coolSeasonLawn() },
  { ref: "C-1002", firstName: "Tomasz", lastName: "Brandt", email: "tomasz.brandt@mail.example", phone: "+13305550112", street: "203 Millrace Road", postalCode: "44990", lawnAreaFt2: 8500, lawn: coolSeasonLawn({ grassType: { species: ["kentucky_bluegrass", "perennial_ryegrass"] } }) },
  { ref: "C-1003", firstName: "Imogen", lastName: "Castellanos", email: "imogen.c@mail.example", phone: null, street: "7 Sorrel Court", postalCode: "44991", lawnAreaFt2: 4200, lawn: coolSeasonLawn({ irrigation: { kind: "hose_end" } }) },
  { ref: "C-1004", firstName: "Walt", lastName: "Fenwick", email: null, phone: "+13305550114", street: "88 Quarry Hill Drive", postalCode: "44991", lawnAreaFt2: 12000, lawn: coolSeasonLawn({ irrigation: { kind: "none" } }) },
  { ref: "C-1005", firstName: "Lucia", lastName: "Marchetti", email: "lucia.marchetti@mail.example", phone: "+13305550115", street: "31 Thistledown Way", postalCode: "44990", lawnAreaFt2: 5400, lawn: coolSeasonLawn({ lawnCondition: "bare" }) },
  { ref: "C-1006", firstName: "Desmond", lastName: "Achterberg", email: "des.achterberg@mail.example", phone: "+13305550116", street: "402 Old Ferry Road", postalCode: "44992", lawnAreaFt2: 9800, lawn: coolSeasonLawn({ grassType: { species: ["tall_fescue", "kentucky_bluegrass"] } }) },
  { ref: "C-1007", firstName: "Hana", lastName: "Sørbye", email: "hana.sorbye@mail.example", phone: "+13305550117", street: "19 Cobble Row", postalCode: "44990", lawnAreaFt2: 3600, lawn: coolSeasonLawn({ irrigation: { kind: "in_ground", zones: 2 } }) },
  { ref: "C-1008", firstName: "Felix", lastName: "Ahlgren", email: "felix.ahlgren@mail.example", phone: "+13305550118", street: "56 Bramblewood Avenue", postalCode: "44992", lawnAreaFt2: 7300, lawn: coolSeasonLawn({ lawnCondition: "thick_dormant" }) },
];

/**
 * Recent visits, dated relative to the day the seed runs so "today" always has steps to show.
 * `frostAfterDays` places the expected first frost after the visit (invented demo numbers).
 */
export const demoVisits = [
  { ref: "C-1001", daysAgo: 6, technician: "marco@cobblefield.example", frostAfterDays: 52, services: ["aeration", "overseeding", "starter_fertiliser"], seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 5, products: [{ name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 4 }] },
  { ref: "C-1002", daysAgo: 12, technician: "priya@cobblefield.example", frostAfterDays: 40, services: ["aeration", "overseeding"], seedMix: [{ species: "kentucky_bluegrass", percent: 60, purityPct: 97, germinationPct: 85 }, { species: "perennial_ryegrass", percent: 40, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 3, products: [] },
  { ref: "C-1003", daysAgo: 2, technician: "marco@cobblefield.example", frostAfterDays: 60, services: ["dethatching", "slit_seeding", "starter_fertiliser"], seedMix: [{ species: "tall_fescue", percent: 90, purityPct: 98, germinationPct: 88 }, { species: "kentucky_bluegrass", percent: 10, purityPct: 97, germinationPct: 82 }], seedRateLbPer1000: 6, products: [{ name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 4 }] },
  { ref: "C-1004", daysAgo: 20, technician: "priya@cobblefield.example", frostAfterDays: 35, services: ["aeration", "overseeding"], seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 4, products: [] },
  { ref: "C-1005", daysAgo: 0, technician: "marco@cobblefield.example", frostAfterDays: 25, services: ["new_seeding", "starter_fertiliser"], seedMix: [{ species: "perennial_ryegrass", percent: 100, purityPct: 98, germinationPct: 92 }], seedRateLbPer1000: 5, products: [{ name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 5 }] },
  { ref: "C-1006", daysAgo: 9, technician: "priya@cobblefield.example", frostAfterDays: 48, services: ["aeration", "overseeding", "starter_fertiliser"], seedMix: [{ species: "tall_fescue", percent: 80, purityPct: 98, germinationPct: 90 }, { species: "kentucky_bluegrass", percent: 20, purityPct: 97, germinationPct: 85 }], seedRateLbPer1000: 5, products: [{ name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 4 }] },
  { ref: "C-1008", daysAgo: 4, technician: "marco@cobblefield.example", frostAfterDays: 50, services: ["fertiliser_only"], seedMix: [], products: [{ name: "Autumn feed 24-0-12 (slow release)", analysis: { n: 24, p: 0, k: 12 }, rateLbPer1000: 3 }] },
] as const;
