import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { hashInput } from "./hash.ts";
import { overseedingVisit } from "./testing/fixtures.ts";

describe("input fingerprint", () => {
  it("ignores the order of object keys and absent-vs-undefined members", () => {
    expect(hashInput({ a: 1, b: "x", c: undefined })).toBe(hashInput({ b: "x", a: 1 }));
  });

  it("changes when any single value of the input changes", () => {
    const base = hashInput(overseedingVisit());
    const changed = overseedingVisit();
    changed.visit.areaFt2 = 6001;
    expect(hashInput(changed)).not.toBe(base);
    const swapped = overseedingVisit();
    swapped.property.timeZone = "America/Chicago";
    expect(hashInput(swapped)).not.toBe(base);
  });

  it("keeps array order, and does not confuse a key with its value", () => {
    expect(hashInput([1, 2])).not.toBe(hashInput([2, 1]));
    expect(hashInput({ a: "b" })).not.toBe(hashInput({ b: "a" }));
    expect(hashInput({ n: 1 })).not.toBe(hashInput({ n: "1" }));
  });

  it("gives distinct fingerprints to distinct JSON values (no collisions in random samples)", () => {
    // Independent canonical form: keys sorted recursively, so equal values print the same.
    const canonical = (v: unknown): string =>
      v !== null && typeof v === "object"
        ? Array.isArray(v)
          ? `[${v.map(canonical).join(",")}]`
          : `{${Object.keys(v as object)
              .sort()
              .map((k) => `${JSON.stringify(k)}:${canonical((v as Record<string, unknown>)[k])}`)
              .join(",")}}`
        : JSON.stringify(v);
    const values = fc.sample(fc.jsonValue(), { numRuns: 2000, seed: 42 });
    const canonicalByHash = new Map<string, string>();
    for (const value of values) {
      const hash = hashInput(value);
      expect(hash).toMatch(/^[0-9a-f]{14}$/);
      const form = canonical(value);
      expect(canonicalByHash.get(hash) ?? form).toBe(form);
      canonicalByHash.set(hash, form);
    }
  });
});
