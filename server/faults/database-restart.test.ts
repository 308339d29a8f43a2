import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createDb } from "../db.ts";
import { signInOverHttp, startServerProcess, type ServerUnderTest } from "./server-process.ts";

// A cluster of its own: stopping it must not disturb the shared test database.
let server: ServerUnderTest;
beforeAll(async () => {
  server = await startServerProcess({ clusterName: "pg-faults", pgPort: 54339, appPort: 5671 });
}, 120_000);
afterAll(async () => server?.stop());

describe("PostgreSQL restarted while requests are flowing", () => {
  it("answers 503 with a retry hint during the outage, recovers by itself, and loses no acknowledged write", async () => {
    const cookie = await signInOverHttp(server, "ruth.okonkwo@mail.example");
    const headers = { cookie, origin: server.url, "content-type": "application/json" };
    const planId = (await (await fetch(`${server.url}/api/my/plans`, { headers })).json()).plans[0].id as number;
    const steps = (await (await fetch(`${server.url}/api/plans/${planId}`, { headers })).json()).plan.steps as { id: number }[];
    expect(steps.length).toBeGreaterThan(20);

    const acknowledged: number[] = [];
    const statuses: number[] = [];
    let retryAfterSeen = false;
    const writer = (async () => {
      for (const step of steps) {
        const res = await fetch(`${server.url}/api/plans/${planId}/steps/${step.id}/state`, { method: "PUT", headers, body: JSON.stringify({ state: "done" }) }).catch(() => undefined);
        if (!res) continue;
        statuses.push(res.status);
        if (res.status === 200) acknowledged.push(step.id);
        if (res.status === 503 && res.headers.get("retry-after")) retryAfterSeen = true;
        await new Promise((r) => setTimeout(r, 60));
      }
    })();

    await new Promise((r) => setTimeout(r, 300));
    server.cluster.stop();
    await new Promise((r) => setTimeout(r, 800));
    const { ensurePostgres } = await import("../../scripts/lib/postgres.ts");
    await ensurePostgres({ name: "pg-faults", port: 54339 });
    const recoveredBy = Date.now() + 10_000;
    let healthy = false;
    while (!healthy && Date.now() < recoveredBy) {
      healthy = await fetch(`${server.url}/api/health`).then((r) => r.status === 200, () => false);
      if (!healthy) await new Promise((r) => setTimeout(r, 200));
    }
    await writer;

    expect(healthy).toBe(true);
    expect(statuses).toContain(503);
    expect(retryAfterSeen).toBe(true);
    const unexpected = statuses.filter((s) => s >= 500 && s !== 503);
    expect(unexpected, `server log:\n${server.stderr().split("\n").filter((l) => l.includes("unhandled") || l.includes("Error")).slice(0, 10).join("\n")}`).toEqual([]);
    // The server recovered without a restart of its own: writes succeed again after the outage.
    const writesAfterOutage = statuses.slice(statuses.lastIndexOf(503) + 1);
    expect(writesAfterOutage.length).toBeGreaterThanOrEqual(5);
    expect(writesAfterOutage.every((s) => s === 200)).toBe(true);

    const db = createDb(server.cluster.url("sproutline_faults"));
    try {
      const done = await db("plan_steps").whereIn("id", acknowledged).andWhere({ state: "done" }).count<{ count: string }[]>("* as count");
      expect(Number(done[0]!.count)).toBe(acknowledged.length);
    } finally {
      await db.destroy();
    }
    expect(server.process.exitCode).toBeNull();
  }, 90_000);
});
