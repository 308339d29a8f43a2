/**
 * Before the API tests: a fresh test database, migrated all the way down and up again
 * (so every migration's `down` is exercised), then seeded.
 */
import type { TestProject } from "vitest/node";
import type {} from "vitest";
import { ensurePostgres, type PostgresCluster } from "../../scripts/lib/postgres.ts";
import { prepareDatabase } from "../../scripts/lib/stack.ts";
import { databases, postgresPort } from "../../scripts/lib/ports.ts";
import { createDb } from "../db.ts";

let cluster: PostgresCluster | undefined;

export async function setup(project: TestProject) {
  cluster = await ensurePostgres({ port: postgresPort });
  const url = await prepareDatabase(cluster, databases.apiTests, true);
  const db = createDb(url);
  try {
    await db.migrate.rollback(undefined, true);
    await db.migrate.latest();
    await db.seed.run();
  } finally {
    await db.destroy();
  }
  project.provide("databaseUrl", url);
}

export async function teardown() {
  if (cluster?.startedHere) cluster.stop();
}

declare module "vitest" {
  export interface ProvidedContext {
    databaseUrl: string;
  }
}
