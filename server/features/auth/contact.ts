import { parsePhoneNumberFromString } from "libphonenumber-js";
import { z } from "zod";

export type Contact = { email: string; phone?: undefined } | { phone: string; email?: undefined };

const emailSchema = z.email();

/**
 * Reads what a homeowner typed as either an e-mail address or a mobile number.
 * Phone numbers are stored in E.164 (ITU-T E.164); numbers without a country code are
 * read as North American, where the company works.
 */
export function parseContact(input: string): Contact | undefined {
  const value = input.trim();
  if (value.includes("@")) {
    return emailSchema.safeParse(value).success ? { email: value.toLowerCase() } : undefined;
  }
  const phone = parsePhoneNumberFromString(value, "US");
  return phone?.isValid() ? { phone: phone.number } : undefined;
}

export function contactKey(contact: Contact): string {
  return contact.email ? `email:${contact.email}` : `phone:${contact.phone}`;
}
