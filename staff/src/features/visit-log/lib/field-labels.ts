const LABELS: Record<string, string> = {
  propertyId: "Customer's lawn",
  "lawn.lawnCondition": "Lawn condition today",
  "visit.date": "Date",
  "visit.services": "Services done",
  "visit.areaFt2": "Area treated",
  "visit.seedMix": "Seed mix",
  "visit.seedRateLbPer1000": "Seed rate",
  "visit.products": "Products",
  "visit.priorPreEmergent.product": "Weed preventer put down before",
  "visit.priorPreEmergent.appliedOn": "Date the weed preventer went down",
  "visit.priorPreEmergent.activeIngredient": "Weed preventer's active ingredient",
  seedBagLb: "Seed bag size",
  "lawn.slope": "Slope",
  "lawn.shade": "Shade",
  "conditions.temperatureF": "Temperature",
  "conditions.windMph": "Wind speed",
  "conditions.windDirection": "Wind direction",
  notes: "Notes",
  "application.product": "Regulated product",
  "application.epaRegistrationNo": "Registration number",
  "application.rate": "Rate applied",
  "application.rateUnit": "Unit of the rate",
  "application.areaTreated": "Area the product went on",
  "application.target": "Target pest or weed",
  "application.applicatorName": "Applicator's name",
  "application.licenceNo": "Licence number",
};

const ROW_LABELS: Record<string, string> = {
  species: "species",
  percent: "share of mix",
  purityPct: "purity",
  germinationPct: "germination",
  name: "name",
  analysis: "analysis",
  "analysis.n": "N",
  "analysis.p": "P",
  "analysis.k": "K",
  rateLbPer1000: "rate",
  bagLb: "bag size",
};

/** "visit.seedMix.1.purityPct" → "Seed line 2, purity": names a field in the error summary. */
export function describeField(path: string): string {
  const row = /^visit\.(seedMix|products)\.(\d+)(?:\.(.+))?$/.exec(path);
  if (row) {
    const [, list, index, rest] = row;
    const item = `${list === "seedMix" ? "Seed line" : "Product"} ${Number(index) + 1}`;
    return rest ? `${item}, ${ROW_LABELS[rest] ?? rest}` : item;
  }
  return LABELS[path] ?? path;
}
