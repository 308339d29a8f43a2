import { z } from "zod";

export const staffRoleSchema = z.enum(["technician", "manager"], "Pick technician or manager");

export const inviteStaffSchema = z.object({
  email: z.string().trim().toLowerCase().max(254, "That is too long for an e-mail address").pipe(z.email("Enter a valid e-mail address")),
  role: staffRoleSchema,
  /** Shown until they first sign in with Google; the e-mail's name part when left out. */
  name: z.string().trim().min(1).max(120).optional(),
});
export type InviteStaff = z.infer<typeof inviteStaffSchema>;

export const changeRoleSchema = z.object({ role: staffRoleSchema });

export const userIdParamSchema = z.object({ userId: z.coerce.number().int().positive().max(2_147_483_647) });

export const teamMemberSchema = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string().nullable(),
  phone: z.string().nullable(),
  role: staffRoleSchema,
  active: z.boolean(),
  /** False until the person has signed in with Google at least once. */
  hasSignedIn: z.boolean(),
  invitedAt: z.string().nullable(),
  invitedByName: z.string().nullable(),
  deactivatedAt: z.string().nullable(),
});
export type TeamMember = z.infer<typeof teamMemberSchema>;

export const teamResponseSchema = z.object({ members: z.array(teamMemberSchema) });
export const teamMemberResponseSchema = z.object({ member: teamMemberSchema });
export const invitationResponseSchema = z.object({ member: teamMemberSchema, invitationSent: z.boolean() });
