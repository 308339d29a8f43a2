/** `npm run db:migrate | db:rollback | db:seed` against DATABASE_URL. */
import "dotenv/config";
import { createDb } from "../server/db.ts";

const command = process.argv[2];
const url = process.env.DATABASE_URL;
if (!url) {
  console.error("Set DATABASE_URL (see .env.example), or use `npm start`, which sets it up for you.");
  process.exit(1);
}
const db = createDb(url);
try {
  if (command === "migrate") {
    const [, applied] = await db.migrate.latest();
    console.log(applied.length ? `applied: ${applied.join(", ")}` : "already up to date");
  } else if (command === "rollback") {
    const [, undone] = await db.migrate.rollback(undefined, process.argv.includes("--all"));
    console.log(undone.length ? `rolled back: ${undone.join(", ")}` : "nothing to roll back");
  } else if (command === "seed") {
    const [ran] = await db.seed.run();
    console.log(`seeded: ${ran.join(", ")}`);
  } else {
    console.error("usage: tsx scripts/knex.ts migrate | rollback [--all] | seed");
    process.exitCode = 1;
  }
} finally {
  await db.destroy();
}
