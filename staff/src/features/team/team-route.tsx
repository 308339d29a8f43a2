import { useState } from "react";
import type { TeamMember } from "#shared/schemas/team";
import { ConfirmDialog, ErrorState, LoadingState, Notice, Page, errorMessage, useSignedInUser } from "#shared/ui/index";
import { useChangeRole } from "./api/change-role.ts";
import { useDeactivateStaff } from "./api/deactivate-staff.ts";
import { useTeam } from "./api/get-team.ts";
import { useInviteStaff } from "./api/invite-staff.ts";
import { InviteForm } from "./components/invite-form.tsx";
import { MemberCard } from "./components/member-card.tsx";

/** Who works here: invite, change roles, deactivate (which ends their sessions). */
export function TeamRoute() {
  const me = useSignedInUser();
  const team = useTeam();
  const changeRole = useChangeRole();
  const deactivate = useDeactivateStaff();
  const reinvite = useInviteStaff();
  const [confirming, setConfirming] = useState<TeamMember | null>(null);
  const [message, setMessage] = useState<{ tone: "success" | "danger"; text: string } | null>(null);

  const busy = changeRole.isPending || deactivate.isPending || reinvite.isPending;
  const failed = (error: unknown) => setMessage({ tone: "danger", text: errorMessage(error) });

  const onChangeRole = (member: TeamMember, role: TeamMember["role"]) => {
    setMessage(null);
    changeRole.mutate(
      { userId: member.id, role },
      { onSuccess: () => setMessage({ tone: "success", text: `${member.name} is now a ${role}. It applies from their next click.` }), onError: failed },
    );
  };
  const onReinvite = (member: TeamMember) => {
    setMessage(null);
    reinvite.mutate(
      { email: member.email!, role: member.role },
      { onSuccess: () => setMessage({ tone: "success", text: `${member.name} is back on the team and was e-mailed the sign-in page.` }), onError: failed },
    );
  };
  const onConfirmDeactivate = () => {
    if (!confirming) return;
    const member = confirming;
    deactivate.mutate(member.id, {
      onSuccess: () => {
        setConfirming(null);
        setMessage({ tone: "success", text: `${member.name} is deactivated and signed out everywhere.` });
      },
    });
  };

  const members = team.data ?? [];
  const active = members.filter((m) => m.active);
  const inactive = members.filter((m) => !m.active);

  return (
    <Page title="Team" intro="Everyone who can sign in to the staff app, and what they may do.">
      <div className="flex flex-col gap-6">
        <InviteForm />
        {message && <Notice tone={message.tone}>{message.text}</Notice>}
        {team.isError && <ErrorState title="The team didn't load" error={team.error} onRetry={() => void team.refetch()} retrying={team.isFetching} />}
        {team.isPending && !team.isError && <LoadingState label="Loading the team…" />}
        {team.data && (
          <>
            <MemberList title={`Active (${active.length})`} id="team-active" members={active} meId={me.id} busy={busy} onChangeRole={onChangeRole} onDeactivate={(m) => { deactivate.reset(); setConfirming(m); }} onReinvite={onReinvite} />
            {inactive.length > 0 && (
              <MemberList title={`Deactivated (${inactive.length})`} id="team-inactive" members={inactive} meId={me.id} busy={busy} onChangeRole={onChangeRole} onDeactivate={() => undefined} onReinvite={onReinvite} />
            )}
          </>
        )}
      </div>
      <ConfirmDialog
        open={confirming !== null}
        title={`Deactivate ${confirming?.name ?? ""}?`}
        confirmLabel="Deactivate"
        pendingLabel="Deactivating…"
        variant="danger"
        pending={deactivate.isPending}
        error={deactivate.error ? errorMessage(deactivate.error) : null}
        onConfirm={onConfirmDeactivate}
        onCancel={() => setConfirming(null)}
      >
        <p>This ends their sessions at once: they are signed out on every device and can't sign in again.</p>
        <p>Their answers, visits and follow-ups stay. You can invite them again later.</p>
      </ConfirmDialog>
    </Page>
  );
}

interface MemberListProps {
  title: string;
  id: string;
  members: TeamMember[];
  meId: number;
  busy: boolean;
  onChangeRole: (member: TeamMember, role: TeamMember["role"]) => void;
  onDeactivate: (member: TeamMember) => void;
  onReinvite: (member: TeamMember) => void;
}

function MemberList({ title, id, members, meId, ...actions }: MemberListProps) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-2xl text-pine-900">
        {title}
      </h2>
      <ul className="flex flex-col gap-3">
        {members.map((member) => (
          <MemberCard key={member.id} member={member} isYou={member.id === meId} {...actions} />
        ))}
      </ul>
    </section>
  );
}
