/** `npm run dev`: like npm start, but the apps are served by Vite with hot reload. */
import { startStack } from "./lib/stack.ts";
import { printBanner, stopOnSignal } from "./lib/banner.ts";
import { databases, runPorts } from "./lib/ports.ts";

const stack = await startStack({ nodeEnv: "development", ports: runPorts, database: databases.run, freshDatabase: false, apps: "vite" });
stopOnSignal(stack);
printBanner(stack, "Sproutline development server (Vite hot reload) is running.");
