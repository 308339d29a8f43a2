import { z } from "zod";

/**
 * Tuning of the reminder worker, from REMINDER_* environment variables. Production defaults are
 * conservative; tests shorten the back-off and the lease so fault tests finish in seconds.
 */
const settingsSchema = z.object({
  /** How often an idle worker looks for due reminders. */
  REMINDER_POLL_MS: z.coerce.number().int().min(10).default(15_000),
  /** Sends in flight at once per worker process. */
  REMINDER_CONCURRENCY: z.coerce.number().int().min(1).max(500).default(20),
  /**
   * A claimed row belongs to its worker this long; after that another worker may take it over (the
   * first one died). Must be well above the provider time-out, or a slow live send could be repeated.
   */
  REMINDER_LEASE_SECONDS: z.coerce.number().int().min(1).default(120),
  /** First retry delay after a transient failure; doubles each attempt, with jitter, up to the maximum. */
  REMINDER_RETRY_BASE_MS: z.coerce.number().int().min(1).default(5_000),
  REMINDER_RETRY_MAX_MS: z.coerce.number().int().min(1).default(15 * 60_000),
  /** Attempts before a reminder counts as failed (then the other channel is tried). */
  REMINDER_MAX_ATTEMPTS: z.coerce.number().int().min(1).default(8),
  /**
   * After a send that timed out (the provider may have accepted it), wait at least this long before
   * looking the message up and, only if it is not there, sending again.
   */
  REMINDER_IN_DOUBT_SETTLE_MS: z.coerce.number().int().min(0).default(30_000),
  /** SMS REST call time-out. */
  REMINDER_SMS_TIMEOUT_MS: z.coerce.number().int().min(100).default(10_000),
  /** Cron (UTC) of the pg-boss job that recomputes every active plan's reminders; "off" disables it. */
  REMINDER_REFRESH_CRON: z.string().default("7 * * * *"),
  /** Also recompute once when the worker starts (catches plans made while no worker ran, e.g. the demo seed). */
  REMINDER_REFRESH_ON_START: z.stringbool().default(true),
  /** Ask the provider for delivery callbacks (off in the benchmark, where no server listens). */
  REMINDER_STATUS_CALLBACKS: z.stringbool().default(true),
});

export type ReminderSettings = z.infer<typeof settingsSchema>;

export function loadReminderSettings(env: NodeJS.ProcessEnv | Record<string, string | undefined> = process.env): ReminderSettings {
  return settingsSchema.parse(env);
}

/** Exponential back-off with "equal jitter": half the delay is fixed, half random, so retries of a burst spread out. */
export function retryDelayMs(attempt: number, settings: Pick<ReminderSettings, "REMINDER_RETRY_BASE_MS" | "REMINDER_RETRY_MAX_MS">, random = Math.random): number {
  const ceiling = Math.min(settings.REMINDER_RETRY_MAX_MS, settings.REMINDER_RETRY_BASE_MS * 2 ** Math.max(0, attempt - 1));
  return Math.round(ceiling / 2 + (ceiling / 2) * random());
}
