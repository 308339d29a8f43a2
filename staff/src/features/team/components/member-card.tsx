import type { TeamMember } from "#shared/schemas/team";
import { Button } from "#shared/ui/index";
import { formatDate, roleNames } from "../lib/roles.ts";

export interface MemberCardProps {
  member: TeamMember;
  isYou: boolean;
  busy: boolean;
  onChangeRole: (member: TeamMember, role: TeamMember["role"]) => void;
  onDeactivate: (member: TeamMember) => void;
  onReinvite: (member: TeamMember) => void;
}

/** One person: who, role, whether they can sign in, and what a manager can do about it. */
export function MemberCard({ member, isYou, busy, onChangeRole, onDeactivate, onReinvite }: MemberCardProps) {
  const otherRole = member.role === "manager" ? "technician" : "manager";
  return (
    <li className={`flex flex-wrap items-start justify-between gap-3 rounded-xl border border-line p-4 ${member.active ? "bg-surface" : "bg-canvas"}`}>
      <div className="min-w-0">
        <h3 className="font-sans text-lg font-bold">
          {member.name}
          {isYou && <span className="font-normal text-ink-soft"> (you)</span>}
        </h3>
        <p className="break-all text-ink-soft">{member.email ?? "No e-mail address"}</p>
        <p className="mt-1 flex flex-wrap gap-2">
          <span className="rounded-full border border-pine-700 bg-pine-50 px-2.5 py-0.5 text-sm font-semibold text-pine-800">{roleNames[member.role]}</span>
          <StateBadge member={member} />
        </p>
      </div>
      <div className="flex flex-wrap gap-2">
        {member.active ? (
          <>
            <Button variant="secondary" disabled={busy} onClick={() => onChangeRole(member, otherRole)}>
              Make {roleNames[otherRole].toLowerCase()}
              <span className="sr-only"> ({member.name})</span>
            </Button>
            {!isYou && (
              <Button variant="quiet" disabled={busy} onClick={() => onDeactivate(member)}>
                Deactivate
                <span className="sr-only"> {member.name}</span>
              </Button>
            )}
          </>
        ) : (
          member.email && (
            <Button variant="secondary" disabled={busy} onClick={() => onReinvite(member)}>
              Invite again
              <span className="sr-only"> ({member.name})</span>
            </Button>
          )
        )}
      </div>
    </li>
  );
}

function StateBadge({ member }: { member: TeamMember }) {
  if (!member.active) {
    return (
      <span className="rounded-full border border-line-strong px-2.5 py-0.5 text-sm font-semibold text-ink-soft">
        Deactivated{member.deactivatedAt ? ` ${formatDate(member.deactivatedAt)}` : ""}
      </span>
    );
  }
  if (!member.hasSignedIn) {
    return (
      <span className="rounded-full border border-straw-800 bg-straw-50 px-2.5 py-0.5 text-sm font-semibold text-straw-800">
        Invited{member.invitedAt ? ` ${formatDate(member.invitedAt)}` : ""}, not signed in yet
      </span>
    );
  }
  return <span className="rounded-full border border-pine-700 px-2.5 py-0.5 text-sm font-semibold text-pine-800">Active</span>;
}
