import { describe, expect, it } from "vitest";
import { auditSentence } from "./sentences.ts";
import type { AuditRow } from "./repo.ts";

const row = (over: Partial<AuditRow>): AuditRow => ({
  id: "1", at: new Date("2026-09-10T14:00:00Z"), action: "plan.read", subject_type: "plan", subject_id: "7",
  detail: {}, ip: null, actor_name: "Marco Ibsen", actor_role: "technician", customer_name: null, street: null, subject_name: null, ...over,
});

describe("audit entries in words", () => {
  it("says who did what for whom, with the lawn's street when there is one", () => {
    expect(auditSentence(row({ action: "visit.logged", subject_type: "visit", customer_name: "Hana Sørbye", street: "19 Cobble Row" }))).toBe(
      "Marco Ibsen logged a visit for Hana Sørbye, 19 Cobble Row",
    );
    expect(auditSentence(row({ action: "customer.read", subject_type: "customer", customer_name: "Hana Sørbye" }))).toBe("Marco Ibsen opened the customer record for Hana Sørbye");
  });

  it("counts an import's visits from what was kept with the entry", () => {
    expect(auditSentence(row({ action: "customers.imported", actor_name: "Dana Whitlow", detail: { created: 12, total: 14 } }))).toBe("Dana Whitlow imported 12 of 14 visits from a file");
    // Entries written before the counts were kept.
    expect(auditSentence(row({ action: "customers.imported", actor_name: "Dana Whitlow" }))).toBe("Dana Whitlow imported visits from a file");
  });

  it("names a deleted place by the name it had, and a person no longer on file as such", () => {
    expect(auditSentence(row({ action: "place.deleted", subject_type: "place", actor_name: null, detail: { name: "Lake County" } }))).toBe("Someone no longer on file deleted the place Lake County");
  });

  it("still says who and which record for an action without words yet", () => {
    expect(auditSentence(row({ action: "payment.refunded", subject_id: "42" }))).toBe('Marco Ibsen did "payment.refunded" on record 42');
  });
});
