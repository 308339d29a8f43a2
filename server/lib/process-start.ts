import { loadConfig, ConfigError, type Config } from "../config.ts";
import { createLogger, logFunction, type Logger, type ProcessLog } from "./logger.ts";

/*
 * What every long-running process of ours (server, reminder worker, inbound e-mail) does first:
 * a logger that names the process, and a configuration that is valid or a plain message
 * and exit code 1 instead of a stack trace.
 */
export type { ProcessLog } from "./logger.ts";

export type ProcessLogging = { logger: Logger; log: ProcessLog };

export function processLogging(name: string): ProcessLogging {
  const logger = createLogger(name);
  return { logger, log: logFunction(logger) };
}

/** The configuration, or the reason it is not valid in the log and exit code 1. */
export function configOrExit<T = Config>(logger: Logger, load: () => T = loadConfig as () => T): T {
  try {
    return load();
  } catch (err) {
    logger.fatal(err instanceof ConfigError ? err.message : `Configuration is not valid: ${err instanceof Error ? err.message : String(err)}`);
    // pino writes asynchronously: let the line out before exiting.
    logger.flush();
    process.exit(1);
  }
}
