import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { inviteStaffSchema } from "#shared/schemas/team";
import { Button, Notice, SelectField, TextField, applyServerErrors } from "#shared/ui/index";
import { useInviteStaff } from "../api/invite-staff.ts";
import { roleHint, roleOptions } from "../lib/roles.ts";

type InviteValues = z.input<typeof inviteStaffSchema>;

/** Invite by e-mail with a role. They sign in with the Google account of that address. */
export function InviteForm() {
  const { register, handleSubmit, setError, reset, formState } = useForm<InviteValues, unknown, z.output<typeof inviteStaffSchema>>({
    resolver: zodResolver(inviteStaffSchema),
    defaultValues: { email: "", role: "technician" },
  });
  const invite = useInviteStaff();
  const [formError, setFormError] = useState<string | null>(null);
  const [result, setResult] = useState<{ name: string; email: string; sent: boolean } | null>(null);

  const submit = handleSubmit((body) => {
    setFormError(null);
    setResult(null);
    invite.mutate(body, {
      onSuccess: ({ member, invitationSent }) => {
        setResult({ name: member.name, email: member.email ?? body.email, sent: invitationSent });
        reset({ email: "", role: body.role });
      },
      onError: (error) => setFormError(applyServerErrors(error, setError, ["email", "role"])),
    });
  });

  return (
    <section aria-labelledby="invite-heading" className="rounded-xl border border-line bg-surface p-4">
      <h2 id="invite-heading" className="text-2xl text-pine-900">
        Invite someone
      </h2>
      <p className="mt-1 text-ink-soft">They get an e-mail with the sign-in page and sign in with the Google account of that address.</p>
      <form noValidate onSubmit={(e) => void submit(e)} className="mt-4 flex flex-col gap-4">
        {formError && <Notice tone="danger">{formError}</Notice>}
        {result &&
          (result.sent ? (
            <Notice tone="success">
              {result.name} is on the team. We e-mailed {result.email} the sign-in page.
            </Notice>
          ) : (
            <Notice tone="warning" title="The e-mail didn't go">
              {result.name} is on the team, but the invitation e-mail could not be sent. Tell them to sign in with Google at {window.location.origin}/staff/sign-in.
            </Notice>
          ))}
        <div className="grid gap-4 sm:grid-cols-2 sm:items-start">
          <TextField label="E-mail address" type="email" autoComplete="off" error={formState.errors.email?.message} {...register("email")} />
          <SelectField label="Role" options={roleOptions} error={formState.errors.role?.message} {...register("role")} />
        </div>
        <p className="text-ink-soft">{roleHint}</p>
        <Button type="submit" className="self-start" pending={invite.isPending} pendingLabel="Inviting…">
          Send invitation
        </Button>
      </form>
    </section>
  );
}
