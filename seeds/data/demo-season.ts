/**
 * An invented autumn 2026 season for the demo company, so the callback report has history
 * to show: 40 seeding visits from mid-August to early October, the follow-up visits some of
 * them needed, and the manager's saved replies. Every name, address and figure is made up;
 * e-mail addresses use the reserved .example domain (RFC 2606) and phone numbers the
 * fictional 555-01xx range.
 */
import type { FollowUpOutcome, FollowUpReason, FollowUpStatus } from "../../shared/schemas/follow-ups.ts";

const firstNames = ["Alma", "Bram", "Cleo", "Dario", "Edda", "Fintan", "Greta", "Hollis", "Ines", "Jonas", "Kaia", "Leif", "Mira", "Nils", "Odile", "Piet", "Quinn", "Rosa", "Soren", "Talia"];
const lastNames = ["Ashdown", "Birchall", "Corran", "Dunmore", "Elsworth", "Fairbank", "Gillow", "Hartree", "Ivesdale", "Jessop"];
const streets = ["Hazel Row", "Kestrel Drive", "Mill Pond Road", "Orchard Close", "Tanner Street", "Willowby Lane", "Fernhill Court", "Copper Beech Way"];

/** Expected first frost at Wrenmoor this autumn (invented, in the range usual for northern Ohio). */
export const seasonFrostDate = "2026-10-24";

export type SeasonVisit = {
  ref: string;
  firstName: string;
  lastName: string;
  email: string;
  phone: string | null;
  street: string;
  postalCode: string;
  lawnAreaFt2: number;
  irrigation: "in_ground" | "hose_end" | "none";
  date: string;
  technician: "marco@cobblefield.example" | "priya@cobblefield.example";
  services: string[];
  seedMix: { species: string; percent: number; purityPct: number; germinationPct: number }[];
  seedRateLbPer1000: number;
  products: { name: string; analysis: { n: number; p: number; k: number }; rateLbPer1000: number }[];
  /** Share of the plan's due steps the homeowner ticked off (the rest split between skipped and left open). */
  adherence: number;
};

const serviceSets = [
  ["aeration", "overseeding", "starter_fertiliser"],
  ["aeration", "overseeding"],
  ["dethatching", "slit_seeding", "starter_fertiliser"],
  ["new_seeding", "starter_fertiliser"],
];
const fescueMix = [{ species: "tall_fescue", percent: 90, purityPct: 98, germinationPct: 90 }, { species: "kentucky_bluegrass", percent: 10, purityPct: 97, germinationPct: 85 }];
const ryeBlueMix = [{ species: "kentucky_bluegrass", percent: 60, purityPct: 97, germinationPct: 85 }, { species: "perennial_ryegrass", percent: 40, purityPct: 98, germinationPct: 90 }];
const starter = { name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 4 };

/** Customers (by index) whose lawns needed a callback: their homeowners ticked off fewer steps. */
const callbackCustomers = new Set([2, 7, 11, 18, 25, 33]);

function isoDate(dayOfSeason: number): string {
  const d = new Date(Date.UTC(2026, 7, 17 + dayOfSeason)); // 17 August 2026 onwards
  return d.toISOString().slice(0, 10);
}

export const seasonVisits: SeasonVisit[] = Array.from({ length: 40 }, (_, i) => {
  const services = serviceSets[i % 7 === 3 ? 3 : i % 5 === 2 ? 2 : i % 3 === 1 ? 1 : 0]!;
  const seedMix = i % 4 === 1 ? ryeBlueMix : fescueMix;
  const newSeeding = services.includes("new_seeding");
  return {
    ref: `S-${2001 + i}`,
    firstName: firstNames[i % firstNames.length]!,
    lastName: lastNames[(i * 3) % lastNames.length]!,
    email: `${firstNames[i % firstNames.length]!.toLowerCase()}.${lastNames[(i * 3) % lastNames.length]!.toLowerCase()}${i}@mail.example`,
    phone: i % 2 === 0 ? `+1330555${String(120 + i).padStart(4, "0")}` : null,
    street: `${10 + ((i * 37) % 380)} ${streets[i % streets.length]}`,
    postalCode: i % 3 === 0 ? "44990" : i % 3 === 1 ? "44991" : "44992",
    lawnAreaFt2: 3000 + ((i * 733) % 9000),
    irrigation: i % 6 === 5 ? "none" : i % 3 === 2 ? "hose_end" : "in_ground",
    // Roughly one visit a working day and a half, 17 August to 9 October.
    date: isoDate(Math.floor(i * 1.35)),
    // Marco does 24 of the 40 seeding visits, Priya 16.
    technician: i % 5 === 1 || i % 5 === 3 ? "priya@cobblefield.example" : "marco@cobblefield.example",
    services,
    seedMix,
    seedRateLbPer1000: seedMix === ryeBlueMix ? (newSeeding ? 5 : 3) : newSeeding ? 8 : 5,
    products: services.includes("starter_fertiliser") ? [starter] : [],
    adherence: callbackCustomers.has(i) ? 0.45 + (i % 3) * 0.05 : 0.75 + (i % 5) * 0.05,
  };
});

export type SeasonFollowUp = {
  ref: string;
  reason: FollowUpReason;
  reasonNote: string;
  isCallback: boolean;
  status: FollowUpStatus;
  /** Days after the original visit that it was booked, and that it was (or is) scheduled for. */
  bookedAfterDays: number;
  scheduledAfterDays: number | null;
  technician: SeasonVisit["technician"] | null;
  labourHours: number | null;
  materialsCost: number | null;
  outcome: FollowUpOutcome;
  outcomeNote: string | null;
};

export const seasonFollowUps: SeasonFollowUp[] = [
  { ref: "S-2003", reason: "under_watering", reasonNote: "Watered once every few days in the heat; seed dried out on the south side.", isCallback: true, status: "closed", bookedAfterDays: 16, scheduledAfterDays: 19, technician: "marco@cobblefield.example", labourHours: 2, materialsCost: 38.5, outcome: "resolved", outcomeNote: "Reseeded the bare patches and went over the watering plan again." },
  { ref: "S-2008", reason: "washed_out", reasonNote: "Two inches of rain two days after seeding; seed collected along the driveway.", isCallback: true, status: "closed", bookedAfterDays: 9, scheduledAfterDays: 12, technician: "priya@cobblefield.example", labourHours: 1.5, materialsCost: 27, outcome: "resolved", outcomeNote: null },
  { ref: "S-2012", reason: "mowed_too_early", reasonNote: "Mowed at day 10 with a low blade; seedlings pulled out.", isCallback: true, status: "done", bookedAfterDays: 14, scheduledAfterDays: 17, technician: "marco@cobblefield.example", labourHours: 2.5, materialsCost: 44, outcome: "partly_resolved", outcomeNote: "Late in the season; thin areas may need spring seeding." },
  { ref: "S-2019", reason: "no_germination", reasonNote: "Almost nothing up after three weeks in the back lawn.", isCallback: true, status: "closed", bookedAfterDays: 21, scheduledAfterDays: 24, technician: "priya@cobblefield.example", labourHours: 3, materialsCost: 65, outcome: "not_resolved", outcomeNote: "Heavy thatch left from before; recommend dethatching and slit seeding next spring." },
  { ref: "S-2026", reason: "herbicide_applied", reasonNote: "A neighbour's lawn service sprayed weed-and-feed along the shared border.", isCallback: true, status: "scheduled", bookedAfterDays: 18, scheduledAfterDays: 23, technician: "marco@cobblefield.example", labourHours: null, materialsCost: null, outcome: "pending", outcomeNote: null },
  { ref: "S-2034", reason: "under_watering", reasonNote: "Hose-end sprinkler did not reach the front corner.", isCallback: true, status: "requested", bookedAfterDays: 15, scheduledAfterDays: null, technician: null, labourHours: null, materialsCost: null, outcome: "pending", outcomeNote: null },
  { ref: "S-2005", reason: "disease", reasonNote: "Brown patches after the warm wet week; homeowner asked for a look.", isCallback: false, status: "done", bookedAfterDays: 25, scheduledAfterDays: 27, technician: "priya@cobblefield.example", labourHours: null, materialsCost: null, outcome: "pending", outcomeNote: null },
  { ref: "S-2015", reason: "other", reasonNote: "Check-in visit before the first mow, as promised at the sale.", isCallback: false, status: "closed", bookedAfterDays: 12, scheduledAfterDays: 20, technician: "marco@cobblefield.example", labourHours: null, materialsCost: null, outcome: "pending", outcomeNote: null },
];

export const seasonSavedReplies = [
  {
    title: "Patchy sprouting is normal",
    body: "Hi {{firstName}}, thanks for the photo. Seed sown on {{visitDate}} comes up unevenly: ryegrass first, fescue a week later and bluegrass last. Keep the top of the soil moist and send another photo in a week. — {{companyName}}",
  },
  {
    title: "When to mow",
    body: "Hi {{firstName}}, please hold off mowing until {{firstMowDate}}. Then mow at the highest setting with a sharp blade, when the grass is dry, and take off no more than a third of its height.",
  },
  {
    title: "Booking a return visit",
    body: "Hi {{firstName}}, from your photos some areas haven't taken. We'll come back to look and reseed where needed at no charge. We'll text you the date. — {{companyName}}",
  },
];
