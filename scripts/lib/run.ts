import { spawn } from "node:child_process";
import { resolve } from "node:path";

const repoRoot = resolve(import.meta.dirname, "../..");

/** Runs a command from node_modules/.bin (or PATH) in the repo, resolving with its exit code. */
export function run(command: string, args: string[], env: NodeJS.ProcessEnv = {}): Promise<number> {
  const local = resolve(repoRoot, "node_modules/.bin", command);
  return new Promise((done) => {
    const child = spawn(local, args, { cwd: repoRoot, stdio: "inherit", env: { ...process.env, ...env } });
    child.on("error", () => done(127));
    child.on("exit", (code, signal) => done(code ?? (signal ? 1 : 0)));
  });
}
