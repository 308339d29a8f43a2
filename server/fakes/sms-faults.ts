import { z } from "zod";
import { twilioError, type TwilioErrorBody } from "./twilio-format.ts";

/** Faults the SMS gateway can be told to produce, at start or at runtime through POST /__control. */
export const smsFaultSettingsSchema = z.object({
  /** Share of otherwise valid sends answered with 500 or 503 (0..1). */
  failureRate: z.number().min(0).max(1),
  /** Delay before every REST answer, to test the app's time-outs. */
  latencyMs: z.number().int().min(0).max(120_000),
  /** Accepted messages per sender (From or MessagingServiceSid) per rolling second; 0 means no limit. */
  rateLimitPerSecond: z.number().int().min(0),
  /** When true, every REST call is answered 503 as during an outage. */
  down: z.boolean(),
});
export type SmsFaultSettings = z.infer<typeof smsFaultSettingsSchema>;

export const defaultSmsFaults: SmsFaultSettings = { failureRate: 0, latencyMs: 0, rateLimitPerSecond: 0, down: false };

/** E.164 as Twilio accepts it. */
const e164 = /^\+[1-9]\d{6,14}$/;

/** Numbers ending in 0000 stand for numbers that do not exist: a permanent error the app must not retry. */
export function isInvalidNumber(to: string): boolean {
  return !e164.test(to) || to.endsWith("0000");
}

/** Decides, for each send, whether a configured fault answers it instead of success. */
export class SmsFaultPolicy {
  private settings: SmsFaultSettings;
  /** Send times of accepted messages per sender, trimmed to the last second. */
  private readonly recentSends = new Map<string, number[]>();

  constructor(
    initial: Partial<SmsFaultSettings> = {},
    private readonly random: () => number = Math.random,
    private readonly now: () => number = Date.now,
  ) {
    this.settings = smsFaultSettingsSchema.parse({ ...defaultSmsFaults, ...initial });
  }

  current(): SmsFaultSettings {
    return { ...this.settings };
  }

  update(patch: Partial<SmsFaultSettings>): SmsFaultSettings {
    this.settings = smsFaultSettingsSchema.parse({ ...this.settings, ...patch });
    if (this.settings.rateLimitPerSecond === 0) this.recentSends.clear();
    return this.current();
  }

  /** Checked before authentication and validation: an outage answers everything. */
  outage(): TwilioErrorBody | null {
    return this.settings.down ? twilioError(503, 20503, "Service Unavailable") : null;
  }

  /**
   * Checked for a valid send. Rate-limited attempts do not count against the window, so a client
   * that backs off gets through again after a second, as with the real service.
   */
  sendFault(sender: string): TwilioErrorBody | null {
    const limit = this.settings.rateLimitPerSecond;
    if (limit > 0) {
      const cutoff = this.now() - 1000;
      const recent = (this.recentSends.get(sender) ?? []).filter((t) => t > cutoff);
      this.recentSends.set(sender, recent);
      if (recent.length >= limit) {
        return twilioError(429, 20429, "Too Many Requests");
      }
    }
    if (this.settings.failureRate > 0 && this.random() < this.settings.failureRate) {
      return this.random() < 0.5
        ? twilioError(500, 20500, "An internal server error has occurred")
        : twilioError(503, 20503, "Service Unavailable");
    }
    if (limit > 0) this.recentSends.get(sender)?.push(this.now());
    return null;
  }

  latencyMs(): number {
    return this.settings.latencyMs;
  }
}
