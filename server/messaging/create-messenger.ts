import type { Config } from "../config.ts";
import type { Messenger } from "./messenger.ts";
import { createSmsSender } from "../adapters/sms.ts";
import { createEmailSender } from "../adapters/email.ts";

/** Real twilio and nodemailer; the *_BASE_URL and SMTP settings point them at the fakes outside production. */
export function createMessenger(config: Config): Messenger {
  const sms = createSmsSender({
    accountSid: config.TWILIO_ACCOUNT_SID,
    authToken: config.TWILIO_AUTH_TOKEN,
    from: config.TWILIO_FROM,
    apiBaseUrl: config.TWILIO_API_BASE_URL,
  });
  const email = createEmailSender({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE,
    auth: config.SMTP_USER ? { user: config.SMTP_USER, pass: config.SMTP_PASSWORD ?? "" } : undefined,
    from: config.EMAIL_FROM,
  });
  return {
    sendEmail: async (message) => ({ providerId: (await email.send(message)).messageId }),
    sendSms: async (message) => ({ providerId: (await sms.send(message)).sid }),
  };
}
