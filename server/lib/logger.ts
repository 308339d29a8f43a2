import { pino, type DestinationStream, type Level, type Logger } from "pino";

export type { Logger } from "pino";

/*
 * One logger for every long-running process (server, reminder worker, inbound e-mail): JSON lines
 * an operator's tools can read, one per event, each naming its process. Under `npm run dev` and
 * `npm start` (NODE_ENV=development) the same lines are pretty-printed by pino-pretty in a worker
 * thread, prefixed "[server]", "[worker]"… as the hand-written lines were. Tests stay quiet unless
 * they ask (LOG_LEVEL).
 */
const LEVELS: readonly string[] = ["fatal", "error", "warn", "info", "debug", "trace", "silent"];

export function logLevelFrom(env: NodeJS.ProcessEnv): Level | "silent" {
  const wanted = env.LOG_LEVEL?.trim().toLowerCase();
  if (wanted && LEVELS.includes(wanted)) return wanted as Level | "silent";
  return env.NODE_ENV === "test" ? "silent" : "info";
}

/** Values that must never reach a log line, wherever a caller happens to put them. */
export const REDACTED_PATHS = [
  "req.headers.cookie",
  "req.headers.authorization",
  'res.headers["set-cookie"]',
  "*.email",
  "*.phone",
  "*.token",
  "*.password",
  "*.contact",
];

// Errors quote what they failed on: a rejected recipient (SMTP), a duplicate key's value (PostgreSQL's
// "detail"). Error lines are rare, so masking their text costs nothing on the busy path.
const EMAIL_IN_TEXT = /[^\s<>()"',;:]+@[^\s<>()"',;:]+\.[A-Za-z]{2,}/g;
const PHONE_IN_TEXT = /\+?\d[\d ().-]{8,}\d/g;
const ERROR_FIELDS_DROPPED = ["detail", "response", "rejected", "rejectedErrors", "accepted", "envelope", "parameters", "bindings", "where"];

export function maskContacts(text: string): string {
  return text.replace(EMAIL_IN_TEXT, "[e-mail]").replace(PHONE_IN_TEXT, "[phone]");
}

function safeError(err: Error): Record<string, unknown> {
  const plain = pino.stdSerializers.err(err) as unknown as Record<string, unknown>;
  for (const key of ERROR_FIELDS_DROPPED) delete plain[key];
  for (const key of ["message", "stack"]) if (typeof plain[key] === "string") plain[key] = maskContacts(plain[key]);
  return plain;
}

export type LoggerOptions = {
  env?: NodeJS.ProcessEnv;
  /** Where lines go instead of standard output (tests capture them). */
  destination?: DestinationStream;
  level?: Level | "silent";
};

export function createLogger(name: string, options: LoggerOptions = {}): Logger {
  const env = options.env ?? process.env;
  const level = options.level ?? logLevelFrom(env);
  const base = { level, base: { name }, redact: { paths: REDACTED_PATHS, censor: "[redacted]" }, serializers: { err: safeError } };
  if (options.destination) return pino(base, options.destination);
  const pretty = (env.NODE_ENV ?? "development") === "development" && env.LOG_FORMAT !== "json";
  if (pretty) {
    return pino({
      ...base,
      transport: {
        target: "pino-pretty",
        // A request on one line: its fields go into the message instead of a block below it.
        options: {
          destination: 2, // standard error, as below
          colorize: !env.NO_COLOR,
          translateTime: "SYS:HH:MM:ss",
          ignore: "pid,hostname,name,req,res,requestId,responseTime,userId,role",
          messageFormat: `[${name}] {msg}{if responseTime} {responseTime} ms{end}{if userId} user {userId} {role}{end}{if requestId} {requestId}{end}`,
        },
      },
    });
  }
  // Standard error, where these processes always wrote (test stacks ignore standard output).
  // Asynchronous writes: a burst of requests never waits on the terminal or the log collector;
  // pino flushes what is buffered when the process exits.
  return pino(base, pino.destination({ dest: 2, sync: false }));
}

/**
 * The (message, error?) callback the features already take (dispatcher, listener, audit): an
 * error is logged with its stack at "error", a plain message at "info".
 */
export type ProcessLog = (message: string, err?: unknown) => void;

export function logFunction(logger: Logger): ProcessLog {
  return (message, err) => {
    if (err === undefined || err === null) logger.info(message);
    // (Messages name records by id; a non-Error thrown value may hold anything.)
    else if (err instanceof Error) logger.error({ err }, message);
    else logger.error({ thrown: maskContacts(String(err)) }, message);
  };
}
