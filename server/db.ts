import knex, { type Knex } from "knex";
import { readdirSync } from "node:fs";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import pg from "pg";

// Plan dates are calendar dates in the lawn's own zone: keep PostgreSQL `date` values as
// "YYYY-MM-DD" strings instead of letting the driver turn them into instants.
const PG_DATE_OID = 1082;
pg.types.setTypeParser(PG_DATE_OID, (value) => value);

export type Db = Knex;

const repoRoot = resolve(import.meta.dirname, "..");
const migrationsDir = resolve(repoRoot, "migrations");
const seedsDir = resolve(repoRoot, "seeds");

const tsFilesIn = (dir: string) => readdirSync(dir).filter((f) => f.endsWith(".ts") && !f.endsWith(".d.ts")).sort();

/**
 * Migrations and seeds are TypeScript modules. They are imported from here rather than by
 * Knex itself, so whichever loader runs this code (tsx, Vitest) also loads them.
 */
const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => tsFilesIn(migrationsDir),
  getMigrationName: (file) => file,
  getMigration: (file) => import(pathToFileURL(resolve(migrationsDir, file)).href),
};

const seedSource = {
  getSeeds: async () => tsFilesIn(seedsDir).map((f) => resolve(seedsDir, f)),
  getSeed: (path: string) => import(pathToFileURL(path).href),
  _getConfigDirectories: () => [seedsDir],
};

export function createDb(connectionString: string, pool = { min: 0, max: 10 }): Db {
  return knex({
    client: "pg",
    connection: connectionString,
    pool,
    acquireConnectionTimeout: 10_000,
    migrations: { migrationSource },
    seeds: { seedSource } as unknown as Knex.SeederConfig,
  });
}
