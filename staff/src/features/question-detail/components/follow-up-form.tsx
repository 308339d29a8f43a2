import { useState } from "react";
import { useForm } from "react-hook-form";
import { FOLLOW_UP_REASONS, followUpReasonLabels, type FollowUp, type FollowUpReason } from "#shared/schemas/follow-ups";
import { Button, CheckboxField, Notice, SelectField, TextAreaField, TextField, applyServerErrors, localToday, useSignedInUser } from "#shared/ui/index";
import { HomeownerVisitFields } from "../../../common/components/homeowner-visit-fields.tsx";
import { useCreateFollowUp } from "../../../common/api/create-follow-up.ts";
import { useTeam } from "../api/get-team.ts";
import { emptyFollowUpForm, followUpFormFields, toFollowUpBody, type FollowUpContext, type FollowUpFormValues } from "../lib/follow-up-form.ts";

export interface FollowUpFormProps {
  context: FollowUpContext;
  onBooked: (followUp: FollowUp) => void;
  onCancel: () => void;
}

/** Why a return visit is needed (from our reasons list), when, and who goes. */
export function FollowUpForm({ context, onBooked, onCancel }: FollowUpFormProps) {
  const user = useSignedInUser();
  const team = useTeam(user.role === "manager");
  const create = useCreateFollowUp();
  const { register, handleSubmit, setError, setValue, watch, formState } = useForm<FollowUpFormValues>({ defaultValues: { ...emptyFollowUpForm, technicianId: user.role === "technician" ? String(user.id) : "" } });
  const [formMessage, setFormMessage] = useState<string | null>(null);
  const errors = formState.errors;

  // Technicians can't list the team, so they book for themselves or leave it to the manager.
  const others = (team.data ?? []).filter((member) => member.id !== user.id).map((member) => ({ value: String(member.id), label: member.name }));
  const technicianOptions = [{ value: String(user.id), label: `Me (${user.name})` }, ...others];

  const submit = handleSubmit((values) => {
    setFormMessage(null);
    const checked = toFollowUpBody(values, context);
    if (!checked.ok) {
      for (const [field, message] of Object.entries(checked.fields)) setError(field as keyof FollowUpFormValues, { type: "schema", message });
      return;
    }
    create.mutate(checked.body, {
      onSuccess: onBooked,
      onError: (error) => setFormMessage(applyServerErrors(error, setError, followUpFormFields)),
    });
  });

  return (
    <form noValidate onSubmit={submit} className="flex flex-col gap-4">
      {formMessage && (
        <Notice tone="danger" title="The follow-up visit wasn't booked">
          {formMessage}
        </Notice>
      )}
      <SelectField
        label="Why is a visit needed?"
        placeholderOption="Pick a reason"
        error={errors.reason?.message}
        options={FOLLOW_UP_REASONS.map((reason) => ({ value: reason, label: followUpReasonLabels[reason] }))}
        {...register("reason")}
      />
      <TextAreaField label="What you saw (optional)" hint="A line for whoever goes, e.g. “bare patch by the drive, seed washed to the kerb”." error={errors.reasonNote?.message} {...register("reasonNote")} />
      <TextField label="Date (optional)" type="date" min={localToday()} error={errors.scheduledFor?.message} {...register("scheduledFor")} />
      <SelectField label="Technician" placeholderOption="Not assigned yet" error={errors.technicianId?.message} options={technicianOptions} {...register("technicianId")} />
      <p className="-mt-2 text-base text-ink-soft">With a date and a technician it is scheduled; otherwise it waits as requested.</p>
      <HomeownerVisitFields
        start={{ error: errors.arrivalStart?.message, ...register("arrivalStart") }}
        end={{ error: errors.arrivalEnd?.message, ...register("arrivalEnd") }}
        prep={{ error: errors.customerPrep?.message, ...register("customerPrep") }}
        reason={watch("reason") as FollowUpReason | ""}
        onSuggest={(text) => setValue("customerPrep", text, { shouldDirty: true })}
      />
      <CheckboxField label="This is a callback" hint="A free return visit because the result failed." {...register("isCallback")} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={create.isPending} pendingLabel="Booking…">
          Book follow-up visit
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
