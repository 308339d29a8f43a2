import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signInOverHttp, startServerProcess, type ServerUnderTest } from "./server-process.ts";

let server: ServerUnderTest;
beforeAll(async () => {
  server = await startServerProcess({ clusterName: "pg-faults", pgPort: 54339, appPort: 5672 });
}, 120_000);
afterAll(async () => server?.stop());

describe("SIGTERM during traffic", () => {
  it("finishes the requests in flight and exits cleanly", async () => {
    const cookie = await signInOverHttp(server, "ruth.okonkwo@mail.example");
    const headers = { cookie };
    const planId = (await (await fetch(`${server.url}/api/my/plans`, { headers })).json()).plans[0].id as number;

    const sent = Array.from({ length: 60 }, () =>
      fetch(`${server.url}/api/plans/${planId}`, { headers }).then(
        async (res) => ({ status: res.status, at: Date.now(), body: await res.json() }),
        () => ({ status: 0, at: Date.now(), body: null }),
      ),
    );
    await new Promise((r) => setTimeout(r, 15));
    const signalledAt = Date.now();
    server.process.kill("SIGTERM");
    const results = await Promise.all(sent);
    const exitCode = await server.exited;

    const answered = results.filter((r) => r.status !== 0);
    // Every request that got an answer got a whole, successful one: nothing was cut off.
    expect(answered.every((r) => r.status === 200 && Array.isArray(r.body.plan.steps))).toBe(true);
    // Some were still in flight when the signal came and were finished, not dropped.
    expect(answered.filter((r) => r.at > signalledAt).length).toBeGreaterThan(0);
    expect(exitCode).toBe(0);
  }, 60_000);
});
