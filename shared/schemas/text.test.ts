import { describe, expect, it } from "vitest";
import { findNul, plainText } from "./text.ts";

describe("findNul", () => {
  it("gives the path of the first NUL in values and keys", () => {
    expect(findNul("a\u0000b")).toEqual([]);
    expect(findNul({ a: "ok", b: [1, { c: "x\u0000" }] })).toEqual(["b", 1, "c"]);
    expect(findNul({ ["k\u0000"]: 1 })).toEqual(["k\u0000"]);
  });

  it("passes text without NUL, other types, and the escaped form people type", () => {
    expect(findNul({ a: "\\u0000 and %00", b: 0, c: null, d: [true] })).toBeNull();
    expect(findNul(undefined)).toBeNull();
  });

  it("plainText refuses NUL", () => {
    expect(plainText().safeParse("fine").success).toBe(true);
    expect(plainText().safeParse("no\u0000").success).toBe(false);
  });
});
