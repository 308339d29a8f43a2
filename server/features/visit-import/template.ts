import { IMPORT_COLUMNS, type ImportColumn } from "#shared/schemas/visit-import";
import { toCsv } from "../follow-ups/csv.ts";

/** One invented example row, so the template shows every column's format. */
const example: Record<ImportColumn, string> = {
  customer_ref: "C-2001",
  first_name: "Avery",
  last_name: "Quill",
  email: "avery.quill@mail.example",
  phone: "330-555-0190",
  street: "12 Example Lane",
  town: "Wrenmoor",
  region: "OH",
  postal_code: "44990",
  time_zone: "America/New_York",
  // US spreadsheets save dates month first; ISO (as in expected_first_frost) is read too.
  visit_date: "09/08/2026",
  services: "aeration;overseeding;starter_fertiliser",
  seed_species: "tall_fescue;kentucky_bluegrass",
  seed_percent: "90;10",
  seed_purity_pct: "98;97",
  seed_germination_pct: "90;85",
  seed_rate_lb_per_1000: "6",
  area_ft2: "5000",
  product_name: "Starter 18-24-12",
  product_n: "18",
  product_p: "24",
  product_k: "12",
  product_rate_lb_per_1000: "4",
  grass_species: "tall_fescue",
  lawn_condition: "thin",
  slope: "gentle",
  shade: "partial",
  irrigation: "in_ground",
  sprinkler_type: "rotor",
  precipitation_rate_in_per_h: "0.6",
  mowing_height_in: "3.5",
  mower_highest_in: "4",
  expected_first_frost: "2026-10-24",
  technician_email: "",
  notes: "Front lawn only",
};

export function templateCsv(): string {
  return `${toCsv(IMPORT_COLUMNS, [IMPORT_COLUMNS.map((c) => example[c])])}\r\n`;
}
