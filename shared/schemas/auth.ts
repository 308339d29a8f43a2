import { z } from "zod";
import { portalNextSchema } from "./next-path.ts";

export const roles = ["customer", "technician", "manager"] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;
export const staffRoles: readonly Role[] = ["technician", "manager"];

/** A homeowner asks for a one-time sign-in link by e-mail address or mobile number. */
export const signInLinkRequestSchema = z.object({
  contact: z
    .string()
    .trim()
    .min(3, "Enter your e-mail address or mobile number")
    .max(254, "That is too long for an e-mail address or phone number"),
  /** The portal page to land on after signing in with the link (a link that was opened signed out). */
  next: portalNextSchema.optional(),
});
export type SignInLinkRequest = z.infer<typeof signInLinkRequestSchema>;

/** The token from the link; opaque, URL-safe base64 of 32 random bytes. */
export const signInLinkConsumeSchema = z.object({
  token: z
    .string()
    .regex(/^[A-Za-z0-9_-]{43}$/, "This sign-in link is not valid"),
});
export type SignInLinkConsume = z.infer<typeof signInLinkConsumeSchema>;

export const currentUserSchema = z.object({
  id: z.number().int(),
  role: roleSchema,
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  customerId: z.number().int().nullable(),
  companyName: z.string(),
});
export type CurrentUser = z.infer<typeof currentUserSchema>;
export const meResponseSchema = z.object({ user: currentUserSchema });
