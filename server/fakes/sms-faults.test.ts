import { describe, expect, it } from "vitest";
import { isInvalidNumber, SmsFaultPolicy } from "./sms-faults.ts";

describe("SmsFaultPolicy", () => {
  it("limits each sender within a rolling second, not counting refused attempts", () => {
    let now = 10_000;
    const policy = new SmsFaultPolicy({ rateLimitPerSecond: 2 }, () => 0.99, () => now);
    expect(policy.sendFault("+1500")).toBeNull();
    expect(policy.sendFault("+1500")).toBeNull();
    expect(policy.sendFault("+1500")).toMatchObject({ status: 429, code: 20429 });
    expect(policy.sendFault("+1501")).toBeNull();
    now += 1001;
    expect(policy.sendFault("+1500")).toBeNull();
  });

  it("fails the configured share of sends with 500 or 503", () => {
    const rolls = [0.1, 0.2, 0.1, 0.9, 0.6];
    const policy = new SmsFaultPolicy({ failureRate: 0.5 }, () => rolls.shift() ?? 0.99);
    expect(policy.sendFault("a")).toMatchObject({ status: 500, code: 20500 });
    expect(policy.sendFault("a")).toMatchObject({ status: 503, code: 20503 });
    expect(policy.sendFault("a")).toBeNull();
  });

  it("validates settings and answers everything 503 while down", () => {
    const policy = new SmsFaultPolicy();
    expect(() => policy.update({ failureRate: 1.5 })).toThrow();
    policy.update({ down: true });
    expect(policy.outage()).toMatchObject({ status: 503 });
  });

  it("treats non-E.164 numbers and numbers ending in 0000 as invalid", () => {
    expect(isInvalidNumber("+13305550123")).toBe(false);
    expect(isInvalidNumber("+13305550000")).toBe(true);
    expect(isInvalidNumber("3305550123")).toBe(true);
  });
});
