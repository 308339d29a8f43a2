import { importLimits } from "#shared/schemas/visit-import";

/** Catches the obvious before uploading: the server would refuse these anyway, only slower. */
export function fileProblem(file: File): string | null {
  if (!/\.csv$/i.test(file.name) && file.type !== "text/csv") return "Choose a .csv file. In a spreadsheet, use “Save as” → CSV (comma-separated).";
  if (file.size === 0) return "This file is empty.";
  if (file.size > importLimits.maxBytes) return `The file must be smaller than ${importLimits.maxBytes / (1024 * 1024)} MB. Split it into several files.`;
  return null;
}
