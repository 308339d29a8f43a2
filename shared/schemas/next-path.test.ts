import { describe, expect, it } from "vitest";
import { portalNextSchema, portalRouterPath, safePortalNext } from "./next-path.ts";

describe("where a link returns after sign-in", () => {
  it.each([
    ["/portal/messages?plan=12", "/portal/messages?plan=12"],
    ["/portal/plan/7#step-3", "/portal/plan/7#step-3"],
    ["/portal", "/portal"],
    ["/portal/", "/portal/"],
    ["/portal/./messages", "/portal/messages"],
  ])("accepts the portal page %s", (raw, expected) => {
    expect(safePortalNext(raw)).toBe(expected);
  });

  it.each([
    ["//evil.example/portal/messages"],
    ["https://evil.example/portal/messages"],
    ["http://localhost/portal/"],
    ["javascript:alert(1)"],
    ["/\\evil.example/portal"],
    ["/staff/"],
    ["/staff/questions/4"],
    ["/portal/../staff/"],
    ["/portal%2F..%2Fstaff"],
    ["/portalx/messages"],
    ["/portal/sign-in"],
    ["/portal/sign-in/verify?token=x"],
    ["portal/messages"],
    ["/portal/\nmessages"],
    [""],
    [null],
  ])("refuses %s", (raw) => {
    expect(safePortalNext(raw)).toBeNull();
  });

  it("as an API field, normalises good paths and refuses the rest", () => {
    expect(portalNextSchema.parse("/portal/./messages?plan=3")).toBe("/portal/messages?plan=3");
    expect(portalNextSchema.safeParse("//evil.example").success).toBe(false);
    expect(portalNextSchema.safeParse("/staff/").success).toBe(false);
  });

  it("maps a portal path to the portal router's own path", () => {
    expect(portalRouterPath("/portal/messages?plan=3")).toBe("/messages?plan=3");
    expect(portalRouterPath("/portal")).toBe("/");
  });
});
