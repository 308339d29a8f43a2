import { z } from "zod";

/**
 * Sproutline's own CSV column set for importing a day's visits (docs/visit-import.md
 * explains each). One row is one visit; list cells use ";" between values.
 */
export const IMPORT_COLUMNS = [
  "customer_ref",
  "first_name",
  "last_name",
  "email",
  "phone",
  "street",
  "town",
  "region",
  "postal_code",
  "time_zone",
  "visit_date",
  "services",
  "seed_species",
  "seed_percent",
  "seed_purity_pct",
  "seed_germination_pct",
  "seed_rate_lb_per_1000",
  "area_ft2",
  "product_name",
  "product_n",
  "product_p",
  "product_k",
  "product_rate_lb_per_1000",
  "grass_species",
  "lawn_condition",
  "slope",
  "shade",
  "irrigation",
  "sprinkler_type",
  "precipitation_rate_in_per_h",
  "mowing_height_in",
  "mower_highest_in",
  "expected_first_frost",
  "technician_email",
  "notes",
] as const;
export type ImportColumn = (typeof IMPORT_COLUMNS)[number];

/** Columns every file must have in its header row (other columns may be left out). */
export const REQUIRED_IMPORT_COLUMNS: readonly ImportColumn[] = ["customer_ref", "street", "visit_date", "services", "area_ft2"];

export const importLimits = {
  /** Upload size. */
  maxBytes: 2 * 1024 * 1024,
  /** Rows per file: the import runs inside the request, at about 30 ms a row (2,000 rows ≈ one minute). */
  maxRows: 2_000,
  /** Rows per progress update. */
  chunkSize: 50,
} as const;

/** The multipart field that carries the CSV file. */
export const IMPORT_FILE_FIELD = "file";

/** Where a row's visit stands: new, already imported (same key), or a repeat of an earlier row of the file. */
export const visitActionSchema = z.enum(["create", "already_imported", "duplicate_in_file"]);

export const importRowPreviewSchema = z.object({
  /** The line in a spreadsheet: the header is row 1, the first visit row 2. */
  row: z.number().int(),
  ok: z.boolean(),
  /** Column name → what is wrong; "row" for problems of the row as a whole. */
  errors: z.record(z.string(), z.string()),
  customerAction: z.enum(["create", "match"]).nullable(),
  visitAction: visitActionSchema.nullable(),
  /** The row's import key (see docs/visit-import.md); null when the row is too broken to have one. */
  visitKey: z.string().nullable(),
  duplicateOfRow: z.number().int().nullable(),
});
export type ImportRowPreview = z.infer<typeof importRowPreviewSchema>;

export const importPreviewResponseSchema = z.object({
  batchId: z.number().int(),
  total: z.number().int(),
  valid: z.number().int(),
  invalid: z.number().int(),
  rows: z.array(importRowPreviewSchema),
});

export const importRowOutcomeSchema = z.object({
  row: z.number().int(),
  outcome: z.enum(["created", "already_imported", "duplicate_in_file", "failed"]),
  errors: z.record(z.string(), z.string()),
  visitId: z.number().int().nullable(),
  planId: z.number().int().nullable(),
  customerId: z.number().int().nullable(),
  duplicateOfRow: z.number().int().nullable(),
});
export type ImportRowOutcome = z.infer<typeof importRowOutcomeSchema>;

export const importResultSchema = z.object({
  batchId: z.number().int(),
  total: z.number().int(),
  created: z.number().int(),
  alreadyImported: z.number().int(),
  duplicates: z.number().int(),
  failed: z.number().int(),
  rows: z.array(importRowOutcomeSchema),
});

export const importBatchStatusSchema = z.object({
  batchId: z.number().int(),
  status: z.enum(["previewed", "running", "done", "failed"]),
  total: z.number().int(),
  processed: z.number().int(),
  created: z.number().int(),
  updatedAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type ImportBatchStatus = z.infer<typeof importBatchStatusSchema>;

export const batchIdParamSchema = z.object({ batchId: z.coerce.number().int().positive().max(2_147_483_647) });
