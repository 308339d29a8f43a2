import { loadConfig, ConfigError, type Config } from "../config.ts";

/*
 * What every long-running process of ours (server, reminder worker, inbound e-mail) does first:
 * a log line format that names the process, and a configuration that is valid or a plain message
 * and exit code 1 instead of a stack trace.
 */
export type ProcessLog = (message: string, err?: unknown) => void;

export function processLog(name: string): ProcessLog {
  return (message, err) => {
    const detail = err instanceof Error ? `\n${err.stack}` : err ? ` ${String(err)}` : "";
    process.stderr.write(`[${name}] ${new Date().toISOString()} ${message}${detail}\n`);
  };
}

/** The configuration, or the reason it is not valid on standard error and exit code 1. */
export function configOrExit<T = Config>(log: ProcessLog, load: () => T = loadConfig as () => T): T {
  try {
    return load();
  } catch (err) {
    log(err instanceof ConfigError ? err.message : `Configuration is not valid: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  }
}
