import Papa from "papaparse";

export interface LocalCsv {
  columns: string[];
  /** Cells by column, keyed by the spreadsheet row number (header = row 1). */
  rows: Map<number, Record<string, string>>;
}

/**
 * Reads the file in the browser only to show its cells next to the server's verdict;
 * the server parses and checks it again, and its answer is the one that counts.
 */
export function readCsvLocally(file: File): Promise<LocalCsv> {
  return new Promise((resolve, reject) => {
    Papa.parse<Record<string, string>>(file, {
      header: true,
      // Always commas: list cells use ";", which papaparse's delimiter guess would otherwise pick.
      delimiter: ",",
      skipEmptyLines: "greedy",
      transformHeader: (name) => name.trim().toLowerCase(),
      complete: (result) => {
        const rows = new Map<number, Record<string, string>>();
        result.data.forEach((record, i) => rows.set(i + 2, record));
        resolve({ columns: result.meta.fields ?? [], rows });
      },
      error: (error) => reject(error),
    });
  });
}
