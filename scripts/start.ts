/** `npm start`: the product with demo data, from a fresh clone, with one command. */
import { startStack } from "./lib/stack.ts";
import { printBanner, stopOnSignal } from "./lib/banner.ts";
import { databases, runPorts } from "./lib/ports.ts";
import { run } from "./lib/run.ts";

const started = Date.now();
process.stdout.write("[start] building the portal and staff apps…\n");
if ((await run("vite", ["build", "--logLevel", "warn"])) !== 0) process.exit(1);

const stack = await startStack({ nodeEnv: "development", ports: runPorts, database: databases.run, freshDatabase: false, apps: "built" });
stopOnSignal(stack);
printBanner(stack, `Sproutline is running (ready in ${Math.round((Date.now() - started) / 1000)} s).`);
