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

const weirdSegment = fc.oneof(
  fc.integer({ min: -5, max: 3_000_000_000 }).map(String),
  fc.string({ maxLength: 12 }),
  fc.constantFrom("0", "-1", "1e309", "NaN", "../../etc/passwd", "%00", "null", "[]", "{}", "large", "thumb", "9007199254740993"),
);
const body = fc.oneof(
  fc.jsonValue({ maxDepth: 3 }),
  fc.dictionary(fc.constantFrom("contact", "token", "state", "reason", "kind", "onDay", "visit", "property", "propertyId", "date", "text", "program"), fc.jsonValue({ maxDepth: 2 }), { maxKeys: 5 }),
);
const query = fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), fc.oneof(fc.string({ maxLength: 10 }), fc.integer().map(String)), { maxKeys: 3 });
const stackTrace = /\n\s+at [^\n]+:\d+:\d+/;

describe("fuzzing every API route as every caller", () => {
  it("never answers 5xx or leaks a stack trace, and every 4xx has the JSON error shape", async () => {
    const routes = collectRoutes({ config: ctx.config, db: ctx.db, messenger: createMessenger(ctx.config), log: () => {} })
      // Sign-out last, so it does not end the sessions the other routes are fuzzed with.
      .sort((a, b) => Number(a.path.endsWith("sign-out")) - Number(b.path.endsWith("sign-out")));
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
            const res = await req;
            const text = res.text ?? "";
            const problem =
              res.status >= 500 ? `status ${res.status}` :
              stackTrace.test(text) ? "stack trace in body" :
              res.status >= 400 && !apiErrorSchema.safeParse(res.body).success ? `4xx without the error shape: ${text.slice(0, 80)}` :
              undefined;
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
