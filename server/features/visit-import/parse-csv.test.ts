import { describe, expect, it } from "vitest";
import { HttpError } from "../../http/errors.ts";
import { columnLetter, readCsv } from "./parse-csv.ts";

const header = "customer_ref,street,visit_date,services,area_ft2";

function fileErrorOf(text: string): string {
  try {
    readCsv(text, 100);
  } catch (err) {
    expect(err).toBeInstanceOf(HttpError);
    return (err as HttpError).message;
  }
  throw new Error("the file was accepted");
}

describe("reading the CSV file", () => {
  it("names columns as a spreadsheet does", () => {
    expect([0, 25, 26, 27, 51, 52, 701, 702].map(columnLetter)).toEqual(["A", "Z", "AA", "AB", "AZ", "BA", "ZZ", "AAA"]);
  });

  it("reads CRLF, LF and lone CR line endings mixed in one file, after a byte-order mark", () => {
    const text = `\uFEFF${header}\r\nR-1,1 A St,9/8/2026,overseeding,100\nR-2,2 B St,9/9/2026,aeration,200\rR-3,"3 C St\r\nBack gate",9/10/2026,aeration,300\r\n`;
    const records = readCsv(text, 100);
    expect(records.map((r) => [r.row, r.cells.customer_ref, r.cells.area_ft2, r.shapeError])).toEqual([
      [2, "R-1", "100", null],
      [3, "R-2", "200", null],
      [4, "R-3", "300", null],
    ]);
    // A line break inside a quoted cell stays one row, written as a plain newline.
    expect(records[2]!.cells.street).toBe("3 C St\nBack gate");
    // No carriage return left at the end of the last column.
    expect(records.every((r) => !/\r/.test(r.cells.area_ft2 ?? ""))).toBe(true);
  });

  it("keeps spreadsheet row numbers across blank lines", () => {
    const records = readCsv(`${header}\nR-1,1 A St,9/8/2026,overseeding,100\n\n,,,,\nR-2,2 B St,9/9/2026,aeration,200\n`, 100);
    expect(records.map((r) => r.row)).toEqual([2, 5]);
  });

  it("names row 1 and the column letter in header errors", () => {
    expect(fileErrorOf(`${header},seed_rate\n`)).toBe('Row 1 (the header): unknown column F "seed_rate". Download the template for the column names.');
    expect(fileErrorOf(`customer_ref,street\nR-1,1 A St\n`)).toMatch(/^Row 1 \(the header\) lacks the required columns visit_date, services, area_ft2\./);
    expect(fileErrorOf(`${header},Street\n`)).toBe('Row 1 (the header): columns B and F are both "street".');
    expect(fileErrorOf(`${header},,notes\n`)).toBe("Row 1 (the header), column F: the column has no name. Name it or delete it.");
  });

  it("names the first missing or extra column of a row with the wrong number of cells", () => {
    const records = readCsv(`${header}\nR-1,1 A St,9/8/2026\nR-2,2 B St,9/9/2026,aeration,200,extra\n`, 100);
    expect(records[0]).toMatchObject({ row: 2, shapeError: expect.stringMatching(/3 cells where the header has 5: column D \(services\) and after are missing/) });
    expect(records[1]).toMatchObject({ row: 3, shapeError: expect.stringMatching(/6 cells where the header has 5: column F is past the last column/) });
  });

  it("points at the row where a quote opens and never closes", () => {
    const records = readCsv(`${header}\nR-1,1 A St,9/8/2026,overseeding,100\nR-2,"2 B St,9/9/2026,aeration,200\nR-3,3 C St,9/10/2026,aeration,300\n`, 100);
    expect(records.map((r) => r.row)).toEqual([2, 3]);
    expect(records[1]!.shapeError).toMatch(/quote \(".*does not close/);
  });

  it("knows the lawn-as-found columns, in any case, and refuses a near miss", () => {
    const records = readCsv(`${header},Lawn_Condition, SLOPE ,Shade\nR-1,1 A St,9/8/2026,overseeding,100,thin,steep,heavy\n`, 100);
    expect(records[0]!.cells).toMatchObject({ lawn_condition: "thin", slope: "steep", shade: "heavy" });
    expect(fileErrorOf(`${header},slope,shadow\n`)).toBe('Row 1 (the header): unknown column G "shadow". Download the template for the column names.');
  });

  it("refuses a file without visit rows", () => {
    expect(fileErrorOf(`${header}\n\n`)).toMatch(/no visit rows under its header/);
  });
});
