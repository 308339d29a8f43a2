import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import request from "supertest";
import { apiErrorSchema } from "#shared/schemas/api-error";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../test/harness.ts";
import { collectRoutes } from "../routes.ts";
import { createMessenger } from "../messaging/create-messenger.ts";

/**
 * Random and malformed bodies, queries and path parameters against every API route as
 * every kind of caller: never a 5xx, never a stack trace, every 4xx in the JSON error shape.
 */
type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let callers: [string, Agent][];

beforeAll(async () => {
  ctx = await createTestContext();
  callers = [
    ["signed out", request.agent(ctx.app)],
    ["customer", await signInCustomer(ctx, "ruth.okonkwo@mail.example")],
    ["technician", await signInStaff(ctx, "marco@cobblefield.example")],
    ["manager", await signInStaff(ctx, "dana@cobblefield.example")],
  ];
});
afterAll(async () => {
  // Random ids may hit real staff through the manager's deactivate route; later test files need them.
  await ctx.db("users").whereIn("role", ["technician", "manager"]).update({ active: true, deactivated_at: null });
  await ctx.close();
});

/**
 * Values PostgreSQL refuses when they reach a query: NUL characters, year 0000 (PostgreSQL has
 * none), years it or JavaScript cannot hold, and dates just outside the product's range.
 */
const NUL_AND_EXTREME_DATES = [
  "\u0000", "Ruth\u0000", "0000-01-01", "0000-12-31T23:59:59Z", "9999-12-31", "1899-12-31", "2200-01-01",
  "+275760-09-13", "-000001-01-01", "2026-02-30",
] as const;
const nasty = fc.constantFrom(...NUL_AND_EXTREME_DATES);
const weirdSegment = fc.oneof(
  fc.integer({ min: -5, max: 3_000_000_000 }).map(String),
  fc.string({ maxLength: 12 }),
  fc.constantFrom("0", "-1", "1e309", "NaN", "../../etc/passwd", "%00", "null", "[]", "{}", "large", "thumb", "9007199254740993"),
  nasty,
);
/** Field and query names the routes read, so nasty values land where they are used. */
const fieldName = fc.constantFrom(
  "contact", "token", "state", "reason", "kind", "onDay", "visit", "property", "propertyId", "date", "text", "program",
  "from", "to", "scheduledFor", "title", "body", "q", "note", "name", "reasonNote", "customerPrep", "answer", "appliedAt",
);
const body = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.dictionary(fieldName, fc.oneof(fc.jsonValue({ maxDepth: 2 }), nasty), { maxKeys: 5 }),
);
const query = fc.dictionary(fc.oneof(fc.string({ minLength: 1, maxLength: 8 }), fieldName), fc.oneof(fc.string({ maxLength: 10 }), fc.integer().map(String), nasty), { maxKeys: 3 });
const stackTrace = /\n\s+at [^\n]+:\d+:\d+/;

const routeTable = () =>
  collectRoutes({ config: ctx.config, db: ctx.db, messenger: createMessenger(ctx.config), log: () => {} })
    // Sign-out (everywhere, then here) last, so it does not end the sessions the other routes are fuzzed with.
    .sort((a, b) => signOutRank(a.path) - signOutRank(b.path));

const signOutRank = (path: string) => (path.endsWith("/sign-out") ? 2 : path.includes("/sign-out") ? 1 : 0);

function problemOf(res: request.Response): string | undefined {
  const text = res.text ?? "";
  return res.status >= 500 ? `status ${res.status}` :
    stackTrace.test(text) ? "stack trace in body" :
    res.status >= 400 && !apiErrorSchema.safeParse(res.body).success ? `4xx without the error shape: ${text.slice(0, 80)}` :
    undefined;
}

/** Every field name above set to one value, at the top and inside `visit`, where plan inputs keep their dates. */
const FIELD_NAMES = ["from", "to", "date", "scheduledFor", "q", "text", "title", "body", "note", "name", "reasonNote", "customerPrep", "contact", "token", "reason", "status", "subjectType", "appliedAt"];
const allFields = (value: string) => ({ ...Object.fromEntries(FIELD_NAMES.map((f) => [f, value])), visit: { date: value } });

describe("fuzzing every API route as every caller", () => {
  it("meets NUL characters and extreme dates in every part of every route without a 5xx or a stack trace", async () => {
    const failures: string[] = [];
    for (const spec of routeTable()) {
      for (const [who, agent] of callers) {
        for (const value of NUL_AND_EXTREME_DATES) {
          const url = spec.path.replace(/:(\w+)/g, () => encodeURIComponent(value));
          let req = agent[spec.method](url).query(Object.fromEntries(FIELD_NAMES.map((f) => [f, value]))).set("X-Forwarded-For", "192.0.2.98");
          if (spec.method !== "get") req = req.set("Content-Type", "application/json").send(JSON.stringify(allFields(value)));
          const res = await req;
          const problem = problemOf(res);
          if (problem) failures.push(`${who} ${spec.method.toUpperCase()} ${url}: ${problem}`);
        }
      }
    }
    expect([...new Set(failures)].slice(0, 20)).toEqual([]);
  }, 240_000);

  it("never answers 5xx or leaks a stack trace, and every 4xx has the JSON error shape", async () => {
    const routes = routeTable();
    const failures: string[] = [];
    for (const spec of routes) {
      for (const [who, agent] of callers) {
        await fc.assert(
          fc.asyncProperty(fc.array(weirdSegment, { minLength: 3, maxLength: 3 }), body, query, fc.boolean(), async (segments, payload, q, asRawText) => {
            let i = 0;
            const url = spec.path.replace(/:(\w+)/g, () => encodeURIComponent(segments[i++] ?? "x"));
            let req = agent[spec.method](url).query(q).set("X-Forwarded-For", "192.0.2.99");
            if (spec.method !== "get") {
              // Well-formed JSON of any type, or JSON cut short by one character.
              const json = JSON.stringify(payload);
              req = req.set("Content-Type", "application/json").send(asRawText ? json.slice(0, -1) || "{" : json);
            }
            const problem = problemOf(await req);
            // Collected rather than failed at once, so every route gets all its runs and one report lists all.
            if (problem) failures.push(`${who} ${spec.method.toUpperCase()} ${url}: ${problem}`);
            return true;
          }),
          { numRuns: 25, seed: 20261201 },
        );
      }
    }
    expect([...new Set(failures)].slice(0, 20)).toEqual([]);
  }, 240_000);
});
