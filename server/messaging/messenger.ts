/**
 * What features need from outgoing messaging. The real implementation wraps the
 * twilio and nodemailer adapters; both reach the local fakes in development and tests.
 */
export type OutgoingEmail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  headers?: Record<string, string>;
};
export type OutgoingSms = { to: string; body: string; statusCallback?: string };

export type Messenger = {
  sendEmail(message: OutgoingEmail): Promise<{ providerId: string }>;
  sendSms(message: OutgoingSms): Promise<{ providerId: string }>;
};
