import { z } from "zod";

/**
 * SESSION_SECRET signs session cookies and also keys the one-click unsubscribe links (HMAC with
 * their own purpose prefix) and seals calendar-feed links (HKDF with their own label), so
 * whoever knows it can forge all three. Secrets that were ever written in this repository
 * (examples, development and test stacks, benchmarks) are public; production refuses them,
 * and anything short or repetitive enough to guess.
 */
export const KNOWN_EXAMPLE_SECRETS: readonly string[] = [
  "change-me-to-a-long-random-string",
  "sproutline-local-session-secret-not-for-production",
  "api-tests-session-secret-0123456789",
  "fault-tests-session-secret-0123456789",
  "bench-session-secret-0123456789",
  "bench-session-secret-0123456789abcdef",
];
export const MIN_PRODUCTION_SECRET_LENGTH = 32;

export function productionSecretProblem(secret: string): string | null {
  if (KNOWN_EXAMPLE_SECRETS.includes(secret)) return "this is an example or development secret; generate a new one (e.g. openssl rand -base64 48)";
  if (/change[-_ ]?me|not[-_ ]?for[-_ ]?production|example/i.test(secret)) return "this looks like a placeholder; generate a real secret (e.g. openssl rand -base64 48)";
  if (secret.length < MIN_PRODUCTION_SECRET_LENGTH) return `must be at least ${MIN_PRODUCTION_SECRET_LENGTH} characters in production (e.g. openssl rand -base64 48)`;
  if (new Set(secret).size < 10) return "has too few different characters to be random (e.g. openssl rand -base64 48)";
  return null;
}

/**
 * Everything the server reads from its environment, validated once at start.
 * The *_BASE_URL settings point a real SDK at a local fake; production refuses them.
 */
const envSchema = z
  .object({
    NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
    PORT: z.coerce.number().int().min(0).max(65535).default(5180),
    PUBLIC_URL: z.url().default("http://localhost:5180"),
    DATABASE_URL: z.string().min(1, "DATABASE_URL is required"),
    SESSION_SECRET: z.string().min(16, "SESSION_SECRET must be at least 16 characters"),
    TRUST_PROXY: z.coerce.number().int().min(0).default(0),

    SMTP_HOST: z.string().default("127.0.0.1"),
    SMTP_PORT: z.coerce.number().int().default(5183),
    SMTP_SECURE: z.stringbool().default(false),
    SMTP_USER: z.string().optional(),
    SMTP_PASSWORD: z.string().optional(),
    EMAIL_FROM: z.string().default("Sproutline <plans@sproutline.example>"),
    // Replies to customer e-mails go to reply+<token>@ this domain, whose mail the inbound SMTP listener receives.
    INBOUND_EMAIL_DOMAIN: z.string().min(3).default("replies.sproutline.example"),
    // The inbound SMTP listener (server/inbound-email.ts) that the domain's MX, or a relay in front of it, delivers to.
    INBOUND_SMTP_HOST: z.string().default("127.0.0.1"),
    INBOUND_SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(5184),
    INBOUND_SMTP_MAX_BYTES: z.coerce.number().int().min(1024).default(30 * 1024 * 1024),
    /** PEM files; when both are set the listener offers STARTTLS. */
    INBOUND_SMTP_TLS_KEY: z.string().optional(),
    INBOUND_SMTP_TLS_CERT: z.string().optional(),

    TWILIO_ACCOUNT_SID: z.string().default("AC00000000000000000000000000000000"),
    TWILIO_AUTH_TOKEN: z.string().default("local-fake-auth-token"),
    TWILIO_FROM: z.string().default("+15005550006"),
    TWILIO_API_BASE_URL: z.url().optional(),

    GOOGLE_CLIENT_ID: z.string().default("sproutline-local-client"),
    GOOGLE_CLIENT_SECRET: z.string().default("sproutline-local-secret"),
    GOOGLE_AUTH_BASE_URL: z.url().optional(),

    /** Where the outbox page reads what the fakes received (development and tests only). */
    FAKES_CONTROL_URL: z.url().optional(),
    /** Where photos are stored (local-disk adapter); never a folder that is served statically. */
    PHOTO_DIR: z.string().min(1).default(".data/photos"),
    /** How long a notice (answer, visit change, welcome) waits to gather later events; read by notices/queue.ts. */
    NOTICE_GATHER_SECONDS: z.coerce.number().int().min(0).max(3600).default(180),
    SIGN_IN_LINK_MINUTES: z.coerce.number().int().min(1).max(60).default(15),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV !== "production") return;
    for (const key of ["TWILIO_API_BASE_URL", "GOOGLE_AUTH_BASE_URL", "FAKES_CONTROL_URL"] as const) {
      if (env[key]) {
        ctx.addIssue({ code: "custom", path: [key], message: "local fakes are not allowed in production" });
      }
    }
    const secretProblem = productionSecretProblem(env.SESSION_SECRET);
    if (secretProblem) ctx.addIssue({ code: "custom", path: ["SESSION_SECRET"], message: secretProblem });
    if (env.TWILIO_AUTH_TOKEN === "local-fake-auth-token") {
      ctx.addIssue({ code: "custom", path: ["TWILIO_AUTH_TOKEN"], message: "set real Twilio credentials in production" });
    }
    if (env.GOOGLE_CLIENT_SECRET === "sproutline-local-secret") {
      ctx.addIssue({ code: "custom", path: ["GOOGLE_CLIENT_SECRET"], message: "set real Google credentials in production" });
    }
  });

export type Config = z.infer<typeof envSchema>;

export class ConfigError extends Error {}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new ConfigError(`Configuration is not valid:\n${lines.join("\n")}`);
  }
  return parsed.data;
}
