import type { InviteStaff, TeamMember } from "#shared/schemas/team";
import type { AppDeps } from "../../app.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { companyName, deleteSessionsOfUser } from "../../auth/users-repo.ts";
import type { Db } from "../../db.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { invitationEmail } from "./invitation-message.ts";
import * as repo from "./repo.ts";

const lastManager = () =>
  new HttpError(409, "last_manager", "The company needs at least one active manager. Make someone else a manager first.");

/**
 * Adds a staff member (an active user with the role) and e-mails them the sign-in page.
 * Someone of this company who was deactivated comes back with the new role. The address
 * of anyone else (a customer, another company's staff) is refused: addresses are unique.
 */
export async function inviteStaff(deps: Pick<AppDeps, "db" | "config" | "messenger" | "log">, user: SessionUser, body: InviteStaff) {
  const { db } = deps;
  const userId = await db.transaction(async (trx) => {
    const existing = await repo.findAccountByEmail(trx, body.email);
    if (!existing) {
      const name = body.name ?? body.email.split("@")[0]!;
      return repo.insertStaff(trx, { companyId: user.companyId, email: body.email, name, role: body.role, invitedBy: user.id });
    }
    const sameCompanyStaff = existing.company_id === user.companyId && existing.role !== "customer";
    if (sameCompanyStaff && existing.active) throw new HttpError(409, "already_member", "This person is already on the team.");
    if (!sameCompanyStaff) throw new HttpError(409, "email_taken", "This e-mail address already belongs to another account, so it cannot be invited as staff.");
    await repo.reactivateStaff(trx, existing.id, body.role, user.id);
    return existing.id;
  });

  let invitationSent = true;
  try {
    const signInUrl = `${deps.config.PUBLIC_URL}/staff/sign-in`;
    await deps.messenger.sendEmail(invitationEmail(body.email, user.name, await companyName(db, user.companyId), body.role, signInUrl));
  } catch (err) {
    // The person is on the team either way; the manager sees that the e-mail did not go and can tell them.
    invitationSent = false;
    deps.log(`staff invitation to user ${userId} could not be sent`, err);
  }
  return { member: (await repo.findMember(db, user.companyId, userId))!, invitationSent };
}

export async function changeRole(db: Db, user: SessionUser, userId: number, role: TeamMember["role"]): Promise<TeamMember> {
  await db.transaction(async (trx) => {
    const managers = await repo.lockActiveManagers(trx, user.companyId);
    const member = await repo.findMember(trx, user.companyId, userId);
    if (!member) throw notFound("That staff member");
    const losesLastManager = member.active && member.role === "manager" && role !== "manager" && managers.length === 1 && managers[0] === member.id;
    if (losesLastManager) throw lastManager();
    await repo.setRole(trx, userId, role);
  });
  // Roles are read from the database on every request, so the change applies at once.
  return (await repo.findMember(db, user.companyId, userId))!;
}

/** Deactivates a staff member and ends all their sessions in the same transaction. */
export async function deactivateStaff(db: Db, user: SessionUser, userId: number): Promise<TeamMember> {
  await db.transaction(async (trx) => {
    const managers = await repo.lockActiveManagers(trx, user.companyId);
    const member = await repo.findMember(trx, user.companyId, userId);
    if (!member) throw notFound("That staff member");
    if (!member.active) return; // already done: the same request twice changes nothing
    if (member.role === "manager" && managers.length === 1 && managers[0] === member.id) throw lastManager();
    if (member.id === user.id) throw new HttpError(409, "cannot_deactivate_self", "You cannot deactivate your own account. Ask another manager.");
    await repo.markDeactivated(trx, userId);
    await deleteSessionsOfUser(trx, userId);
  });
  return (await repo.findMember(db, user.companyId, userId))!;
}
