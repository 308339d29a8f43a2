import { z } from "zod";
import { demoStaff } from "../../seeds/data/demo-company.ts";
import { fakeDefaults, type StartFakesOptions } from "./index.ts";

/** Fixed ports matching scripts/lib/ports.ts (runPorts), so `tsx server/fakes/main.ts` fits `npm run dev`. */
const defaultPorts = { sms: 5181, smtp: 5183, oauth: 5182 };

/** The seeded staff plus someone who is not on staff, to try the refusal path. */
const defaultAccounts = [
  ...demoStaff.map((s) => ({ email: s.email, name: s.name })),
  { email: "visitor@elsewhere.example", name: "Sam Outsider (not on staff)" },
];

const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);

const accountsSchema = z.array(z.object({ email: z.email(), name: z.string().min(1), picture: z.url().optional() }));

const envSchema = z.object({
  FAKE_HOST: z.string().default(fakeDefaults.host),
  FAKE_SMS_PORT: port(defaultPorts.sms),
  FAKE_SMTP_PORT: port(defaultPorts.smtp),
  FAKE_OAUTH_PORT: port(defaultPorts.oauth),
  FAKE_SMS_ACCOUNT_SID: z.string().min(1).default(fakeDefaults.smsAccountSid),
  FAKE_SMS_AUTH_TOKEN: z.string().min(1).default(fakeDefaults.smsAuthToken),
  FAKE_SMS_PHONE_NUMBER: z.string().regex(/^\+[1-9]\d{6,14}$/).default(fakeDefaults.smsPhoneNumber),
  FAKE_SMS_INBOUND_WEBHOOK_URL: z.url().optional(),
  FAKE_OAUTH_CLIENT_ID: z.string().min(1).default(fakeDefaults.oauthClientId),
  FAKE_OAUTH_CLIENT_SECRET: z.string().min(1).default(fakeDefaults.oauthClientSecret),
  FAKE_OAUTH_ACCOUNTS: z
    .string()
    .optional()
    .transform((raw, ctx) => {
      if (!raw) return defaultAccounts;
      let json: unknown;
      try {
        json = JSON.parse(raw);
      } catch {
        ctx.addIssue({ code: "custom", message: 'must be a JSON array such as [{"email":"a@b.example","name":"A B"}]' });
        return z.NEVER;
      }
      const parsed = accountsSchema.safeParse(json);
      if (!parsed.success) {
        ctx.addIssue({ code: "custom", message: z.prettifyError(parsed.error) });
        return z.NEVER;
      }
      return parsed.data;
    }),
  /** Optional comma-separated allow-list of OAuth redirect URIs. */
  FAKE_OAUTH_REDIRECT_URIS: z
    .string()
    .optional()
    .transform((raw) => raw?.split(",").map((s) => s.trim()).filter(Boolean)),
});

export class FakesConfigError extends Error {}

/** Turns the FAKE_* environment variables into startFakes options, with defaults for all of them. */
export function readFakesEnv(env: NodeJS.ProcessEnv): StartFakesOptions {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new FakesConfigError(`The fakes' settings are not valid:\n${lines.join("\n")}`);
  }
  const e = parsed.data;
  return {
    host: e.FAKE_HOST,
    sms: {
      port: e.FAKE_SMS_PORT,
      accountSid: e.FAKE_SMS_ACCOUNT_SID,
      authToken: e.FAKE_SMS_AUTH_TOKEN,
      phoneNumber: e.FAKE_SMS_PHONE_NUMBER,
      inboundWebhookUrl: e.FAKE_SMS_INBOUND_WEBHOOK_URL ?? null,
    },
    smtp: { port: e.FAKE_SMTP_PORT },
    oauth: {
      port: e.FAKE_OAUTH_PORT,
      clientId: e.FAKE_OAUTH_CLIENT_ID,
      clientSecret: e.FAKE_OAUTH_CLIENT_SECRET,
      accounts: e.FAKE_OAUTH_ACCOUNTS,
      redirectUris: e.FAKE_OAUTH_REDIRECT_URIS,
    },
  };
}
