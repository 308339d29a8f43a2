import { zodResolver } from "@hookform/resolvers/zod";
import { useForm } from "react-hook-form";
import { followUpTransitions, type FollowUp, type FollowUpStatus } from "#shared/schemas/follow-ups";
import type { TeamMember } from "#shared/schemas/team";
import { Button, CheckboxField, Dialog, Notice, SelectField, TextAreaField, TextField, applyServerErrors } from "#shared/ui/index";
import { useState } from "react";
import { HomeownerVisitFields } from "../../../common/components/homeowner-visit-fields.tsx";
import { useUpdateFollowUp } from "../api/update-follow-up.ts";
import { followUpFormFields, followUpFormSchema, formValuesOf, patchOf, type FollowUpFormValues } from "../lib/follow-up-form.ts";
import { formatDay, outcomeOptions, reasonOptions, statusLabels } from "../lib/labels.ts";

export interface FollowUpDialogProps {
  followUp: FollowUp;
  /** The status the person asked to move to; the form starts there. */
  targetStatus?: FollowUpStatus;
  staff: readonly TeamMember[];
  onClose: () => void;
}

/** One place to move a follow-up on and, for a callback, record its cost and outcome. */
export function FollowUpDialog({ followUp, targetStatus, staff, onClose }: FollowUpDialogProps) {
  return (
    <Dialog
      open
      onClose={onClose}
      title={`Follow-up for ${followUp.customerName}`}
      description={`${followUp.street} · ${statusLabels[followUp.status]} · ${formatDay(followUp.date)}`}
    >
      <FollowUpForm followUp={followUp} targetStatus={targetStatus} staff={staff} onDone={onClose} />
    </Dialog>
  );
}

function FollowUpForm({ followUp, targetStatus, staff, onDone }: { followUp: FollowUp; targetStatus?: FollowUpStatus; staff: readonly TeamMember[]; onDone: () => void }) {
  const form = useForm<FollowUpFormValues>({
    resolver: zodResolver(followUpFormSchema),
    defaultValues: formValuesOf(followUp, targetStatus),
  });
  const { register, handleSubmit, watch, setError, setValue, formState } = form;
  const errors = formState.errors;
  const update = useUpdateFollowUp();
  const [formError, setFormError] = useState<string | null>(null);
  const [nothingChanged, setNothingChanged] = useState(false);

  const isCallback = watch("isCallback");
  const status = watch("status");
  // A closed follow-up feeds the report: only a callback's cost and outcome may still be corrected.
  const closed = followUp.status === "closed";
  const statusChoices = [followUp.status, ...followUpTransitions[followUp.status]].map((value) => ({ value, label: statusLabels[value] }));
  const technicianChoices = staff
    .filter((member) => member.active || member.id === followUp.technicianId)
    .map((member) => ({ value: String(member.id), label: member.active ? member.name : `${member.name} (deactivated)` }));

  const submit = handleSubmit((values) => {
    setFormError(null);
    const patch = patchOf(followUp, values);
    if (Object.keys(patch).length === 0) {
      setNothingChanged(true);
      return;
    }
    update.mutate(
      { id: followUp.id, patch },
      {
        onSuccess: onDone,
        onError: (error) => setFormError(applyServerErrors(error, setError, followUpFormFields)),
      },
    );
  });

  return (
    <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-4">
      {formError && <Notice tone="danger">{formError}</Notice>}
      {nothingChanged && <Notice>Nothing has changed yet.</Notice>}
      <HomeownerAnswer followUp={followUp} />
      <SelectField label="Status" options={statusChoices} disabled={closed} error={errors.status?.message} {...register("status")} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Visit date" type="date" disabled={closed} error={errors.scheduledFor?.message} {...register("scheduledFor")} />
        <SelectField
          label="Technician"
          options={technicianChoices}
          placeholderOption="Not assigned"
          disabled={closed}
          error={errors.technicianId?.message}
          {...register("technicianId")}
        />
      </div>
      <SelectField label="Reason" options={reasonOptions} disabled={closed} error={errors.reason?.message} {...register("reason")} />
      <TextAreaField label="Reason note (optional)" rows={2} disabled={closed} error={errors.reasonNote?.message} {...register("reasonNote")} />
      <HomeownerVisitFields
        start={{ error: errors.arrivalStart?.message, ...register("arrivalStart") }}
        end={{ error: errors.arrivalEnd?.message, ...register("arrivalEnd") }}
        prep={{ error: errors.customerPrep?.message, ...register("customerPrep") }}
        reason={watch("reason")}
        onSuggest={(text) => setValue("customerPrep", text, { shouldDirty: true })}
        disabled={closed}
      />
      {(status === "done" || followUp.workDone) && (
        <TextAreaField
          label="What was done"
          hint="The homeowner reads this in their plan's visit history."
          rows={3}
          disabled={closed}
          error={errors.workDone?.message}
          {...register("workDone")}
        />
      )}
      <CheckboxField
        label="This is a callback"
        hint="A free return visit because the result failed. Only callbacks count in the callback report and carry a cost."
        disabled={closed}
        {...register("isCallback")}
      />
      {isCallback && <CallbackFields form={form} />}
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={update.isPending} pendingLabel="Saving…">
          Save
        </Button>
      </div>
    </form>
  );
}

function CallbackFields({ form }: { form: ReturnType<typeof useForm<FollowUpFormValues>> }) {
  const { register, formState } = form;
  const errors = formState.errors;
  return (
    <fieldset className="flex flex-col gap-4 rounded-lg border-2 border-loam-100 bg-canvas p-4">
      <legend className="px-1 font-heading text-lg font-bold text-loam-700">Callback cost and outcome</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Labor hours" inputMode="decimal" error={errors.labourHours?.message} {...register("labourHours")} />
        <TextField label="Materials cost ($)" inputMode="decimal" error={errors.materialsCost?.message} {...register("materialsCost")} />
      </div>
      <SelectField label="Outcome" options={outcomeOptions} error={errors.outcome?.message} {...register("outcome")} />
      <TextAreaField label="Outcome note (optional)" rows={2} error={errors.outcomeNote?.message} {...register("outcomeNote")} />
    </fieldset>
  );
}

/** How the homeowner answered the booked visit; a request for another day is also in the question queue. */
function HomeownerAnswer({ followUp }: { followUp: FollowUp }) {
  if (followUp.customerResponse === "confirmed") return <Notice tone="success">The homeowner confirmed this visit.</Notice>;
  if (followUp.customerResponse === "another_day") {
    return (
      <Notice tone="warning" title="The homeowner asked for another day">
        Their message is in the question queue. Pick a new date here; they are told when you save.
      </Notice>
    );
  }
  return null;
}
