import { describe, expect, it } from "vitest";
import { speciesNamedIn, speciesNotInLawn } from "./saved-replies.ts";

describe("grasses a saved reply names", () => {
  it("finds each grass however it is usually written, once", () => {
    expect(speciesNamedIn("Your Tall Fescue and Kentucky bluegrass will fill in; the bluegrass is slower.")).toEqual(["tall_fescue", "kentucky_bluegrass"]);
    expect(speciesNamedIn("Perennial rye comes up first")).toEqual(["perennial_ryegrass"]);
    expect(speciesNamedIn("St. Augustine, St Augustinegrass, Bermuda grass, zoysia, centipede, bahia")).toEqual([
      "bermudagrass",
      "zoysiagrass",
      "st_augustinegrass",
      "centipedegrass",
      "bahiagrass",
    ]);
    expect(speciesNamedIn("Creeping red fescue suits shade")).toEqual(["fine_fescue"]);
  });

  it("leaves out words that name no one grass, and weeds with grass names", () => {
    // "Fescue" alone may be tall or fine fescue; annual ryegrass and annual bluegrass are other plants.
    expect(speciesNamedIn("Fescue lawns like a high cut. Annual ryegrass dies in the heat; annual bluegrass is a weed.")).toEqual([]);
  });

  it("flags grasses the lawn and its seed mix don't have", () => {
    const text = "Tall fescue sprouts in about a week; Kentucky bluegrass takes up to a month.";
    expect(speciesNotInLawn(text, { species: ["tall_fescue"] })).toEqual(["kentucky_bluegrass"]);
    expect(speciesNotInLawn(text, { species: ["tall_fescue", "kentucky_bluegrass"] })).toEqual([]);
  });

  it("with only the lawn's season known, flags grasses of the other season; with nothing known, nothing", () => {
    const text = "Bermudagrass wakes up in spring; the tall fescue stays green.";
    expect(speciesNotInLawn(text, { species: [], season: "cool" })).toEqual(["bermudagrass"]);
    expect(speciesNotInLawn(text, { species: [], season: "warm" })).toEqual(["tall_fescue"]);
    expect(speciesNotInLawn(text, { species: [] })).toEqual([]);
  });
});
