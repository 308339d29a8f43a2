/** Publication names, spelled once so every table and test cites them the same way. */
export const SOURCES = {
  cornellSeedingRates: 'Cornell University, Safe Sports Fields, "Seeding rates"',
  nebraskaColumn2021: "Nebraska Extension column (2021)",
  coloradoAskExtension877015: "Colorado State University Extension, Ask Extension #877015",
  minnesotaAskExtension764665: "University of Minnesota Extension, Ask Extension #764665",
  nebraskaBackyardFarmer: 'University of Nebraska–Lincoln, Backyard Farmer, "Lawn Fertilizer Calculations"',
  countryGardener: 'Country Gardener, "Fertilizer calculations"',
  chicoDuNotes: "California State University, Chico, DU calculator notes",
  irrigationAssociation: "Irrigation Association auditor formulas",
  landGrantEstablishment: "US land-grant extension establishment guides",
  landGrantWarmSeason: "US land-grant extension warm-season lawn guides (southern states)",
  kansasCityStarColumn: "Kansas City Star extension column",
  nist811: "NIST SP 811",
  tradePractice: "Lawn-care trade practice (no single source)",
  productLabel: "The product label",
  ifasTexasAmIrrigation: "University of Florida IFAS and Texas A&M AgriLife irrigation guides",
  sproutlineChoice: "Sproutline default, chosen within the trade's range",
} as const;
