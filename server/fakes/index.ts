import type { OutboxMessage } from "#shared/schemas/outbox";
import { createControlRouter } from "./control-routes.ts";
import { startOAuthProvider, type FakeOAuthProvider, type OAuthProviderOptions } from "./oauth-provider.ts";
import { buildOutbox } from "./outbox.ts";
import { startSmsGateway, type FakeSmsGateway, type SmsGatewayOptions } from "./sms-gateway.ts";
import { startFakeSmtp, type FakeSmtpOptions, type FakeSmtpServer } from "./smtp.ts";

export type { OAuthAccount } from "./oauth-identity.ts";
export type { FakeOAuthProvider } from "./oauth-provider.ts";
export type { FakeSmsGateway } from "./sms-gateway.ts";
export type { SmsFaultSettings } from "./sms-faults.ts";
export type { RecordedSms } from "./sms-log.ts";
export type { FakeSmtpServer, ReceivedEmail } from "./smtp.ts";
export { buildOutbox, extractLinks } from "./outbox.ts";

/** The same defaults as server/config.ts, so the app and the fakes agree with no settings at all. */
export const fakeDefaults = {
  host: "127.0.0.1",
  smsAccountSid: "AC00000000000000000000000000000000",
  smsAuthToken: "local-fake-auth-token",
  smsPhoneNumber: "+15005550006",
  oauthClientId: "sproutline-local-client",
  oauthClientSecret: "sproutline-local-secret",
} as const;

export interface StartFakesOptions {
  /** Loopback address every fake listens on. */
  host?: string;
  /** port 0 (the default) picks a free port. */
  sms?: Partial<Omit<SmsGatewayOptions, "host" | "mount">>;
  smtp?: Omit<FakeSmtpOptions, "host">;
  oauth?: Partial<Omit<OAuthProviderOptions, "host">>;
}

export interface RunningFakes {
  /** Base URL for the Twilio SDK (TWILIO_API_BASE_URL). */
  smsUrl: string;
  /** Where the outbox, message lists and fault controls are (FAKES_CONTROL_URL); the SMS gateway's server. */
  controlUrl: string;
  smtpHost: string;
  smtpPort: number;
  /** Base URL for passport-google-oauth20 (GOOGLE_AUTH_BASE_URL). */
  oauthUrl: string;
  sms: FakeSmsGateway;
  smtp: FakeSmtpServer;
  oauth: FakeOAuthProvider;
  /** Every SMS and e-mail the app sent, newest first. */
  listOutbox(): Promise<OutboxMessage[]>;
  clearOutbox(): Promise<void>;
  stop(): Promise<void>;
}

/** Starts the SMS gateway, SMTP server and OAuth provider on loopback. Development and tests only. */
export async function startFakes(options: StartFakesOptions = {}): Promise<RunningFakes> {
  if (process.env.NODE_ENV === "production") {
    throw new Error("The local fakes of hosted services must never run in production (NODE_ENV=production).");
  }
  const host = options.host ?? fakeDefaults.host;
  const started: Array<{ stop(): Promise<void> }> = [];
  const stopAll = async () => {
    await Promise.allSettled(started.reverse().map((s) => s.stop()));
  };
  try {
    const smtp = await startFakeSmtp({ ...options.smtp, host });
    started.push(smtp);
    // The control routes live on the gateway's own server, so they reach the gateway once it exists.
    const gatewayRef: { current?: FakeSmsGateway } = {};
    const gateway = await startSmsGateway({
      accountSid: fakeDefaults.smsAccountSid,
      authToken: fakeDefaults.smsAuthToken,
      phoneNumber: fakeDefaults.smsPhoneNumber,
      ...options.sms,
      host,
      mount: (app) =>
        app.use(createControlRouter({ listSms: () => gatewayRef.current?.messages() ?? [], clearSms: () => gatewayRef.current?.clear(), smtp })),
    });
    gatewayRef.current = gateway;
    started.push(gateway);
    const oauth = await startOAuthProvider({
      clientId: fakeDefaults.oauthClientId,
      clientSecret: fakeDefaults.oauthClientSecret,
      accounts: [],
      ...options.oauth,
      host,
    });
    started.push(oauth);
    return {
      smsUrl: gateway.url,
      controlUrl: gateway.url,
      smtpHost: smtp.host,
      smtpPort: smtp.port,
      oauthUrl: oauth.url,
      sms: gateway,
      smtp,
      oauth,
      listOutbox: async () => buildOutbox(gateway.messages(), smtp.messages()),
      clearOutbox: async () => {
        gateway.clear();
        smtp.clear();
      },
      stop: stopAll,
    };
  } catch (error) {
    await stopAll();
    throw error;
  }
}
