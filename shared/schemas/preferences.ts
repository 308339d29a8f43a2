import { z } from "zod";

/** Reminder times must fall inside quiet-hours limits: 8 am – 9 pm local (47 CFR § 64.1200(c)(1), from memory). */
export const allowedReminderWindow = { earliest: "08:00", latest: "21:00" } as const;

export const reminderChannelsSchema = z.enum(["sms", "email", "both", "none"]);
export const languageSchema = z.enum(["en", "es"]);
export const unitsSchema = z.enum(["us", "metric"]);

const hhmm = z.string().regex(/^([01]\d|2[0-3]):[0-5]\d$/, "Use a time like 07:30");

export const preferencesSchema = z.object({
  channels: reminderChannelsSchema,
  dailyTime: hhmm.refine((t) => t >= allowedReminderWindow.earliest && t <= allowedReminderWindow.latest, {
    message: "Pick a time between 8:00 am and 9:00 pm",
  }),
  wateringNudges: z.boolean(),
  language: languageSchema,
  units: unitsSchema,
});
export type Preferences = z.infer<typeof preferencesSchema>;

export const preferencesResponseSchema = z.object({
  preferences: preferencesSchema,
  contact: z.object({ email: z.string().nullable(), phone: z.string().nullable() }),
  /** Channels the customer stopped (e.g. texted STOP); they get nothing there until they opt in again. */
  optedOut: z.array(z.enum(["sms", "email"])),
});
export type PreferencesResponse = z.infer<typeof preferencesResponseSchema>;

/** Changing a contact detail sends a confirmation link to the new address; it applies once confirmed. */
export const contactChangeSchema = z
  .object({ email: z.email("Enter a valid e-mail address").optional(), phone: z.string().trim().min(7).max(20).optional() })
  .refine((v) => v.email !== undefined || v.phone !== undefined, { message: "Give a new e-mail address or mobile number" });

export const calendarFeedResponseSchema = z.object({
  /** Secret iCalendar URL (RFC 5545); rotating it makes the old one stop working. */
  url: z.string(),
});
