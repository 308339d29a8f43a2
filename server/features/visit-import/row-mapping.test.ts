import { describe, expect, it } from "vitest";
import { engineErrorsToColumns, mapRow } from "./row-mapping.ts";

/** The cells a row needs to map without errors; lawn columns are added per test. */
const base = { customer_ref: "R-1", street: "1 A St", visit_date: "9/8/2026", services: "overseeding", area_ft2: "1000" };
const lawnOf = (cells: Record<string, string>) => mapRow({ ...base, ...cells }, "America/New_York");

describe("the lawn as found: condition, slope and shade", () => {
  it("reads each as the lawn's record names it, in any case and with spaces or hyphens", () => {
    const { row, errors } = lawnOf({ lawn_condition: "Thick-Dormant", slope: "STEEP", shade: " Heavy " });
    expect(errors).toEqual({});
    expect(row.lawn).toEqual({ lawnCondition: "thick_dormant", slope: "steep", shade: "heavy" });
  });

  it("reads the mild values too, and leaves the facts out when their cells are blank or absent", () => {
    expect(lawnOf({ slope: "gentle", shade: "partial" }).row.lawn).toEqual({ slope: "gentle", shade: "partial" });
    expect(lawnOf({ slope: "none", shade: "none" }).row.lawn).toEqual({ slope: "none", shade: "none" });
    // Blank keeps what a known lawn already has: nothing is given, so nothing is replaced.
    const blank = lawnOf({ lawn_condition: "", slope: "  ", shade: "" });
    expect(blank.errors).toEqual({});
    expect(blank.row.lawn).toEqual({});
    expect(lawnOf({}).row.lawn).toEqual({});
  });

  it("names the column and the allowed values of a value not on the list", () => {
    const { row, errors } = lawnOf({ lawn_condition: "patchy", slope: "cliff", shade: "shady" });
    expect(errors).toEqual({
      lawn_condition: "Use one of: thin, bare, thick_dormant, thick",
      slope: "Use one of: none, gentle, steep",
      shade: "Use one of: none, partial, heavy",
    });
    expect(row.lawn).toEqual({});
  });

  it("refuses a NUL character in a slope or shade cell under its own column", () => {
    const { errors } = lawnOf({ slope: "steep\u0000", shade: "heavy" });
    expect(errors).toEqual({ slope: expect.stringMatching(/NUL character/) });
  });

  it("turns the engine's field paths for slope and shade into their columns", () => {
    expect(engineErrorsToColumns({ "property.slope": "Invalid option", "property.shade": "Invalid option", "property.lawnCondition": "Required" })).toEqual({
      slope: "Invalid option",
      shade: "Invalid option",
      lawn_condition: "Required",
    });
  });
});
