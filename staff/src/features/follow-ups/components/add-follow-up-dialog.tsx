import { useState } from "react";
import { useForm } from "react-hook-form";
import { FOLLOW_UP_REASONS, followUpReasonLabels, type FollowUp, type FollowUpReason } from "#shared/schemas/follow-ups";
import type { CustomerSummary } from "#shared/schemas/customers";
import type { TeamMember } from "#shared/schemas/team";
import {
  Button, CheckboxField, Dialog, Notice, SelectField, TextAreaField, TextField, applyServerErrors, localToday, useDebouncedValue, useSignedInUser,
} from "#shared/ui/index";
import { HomeownerVisitFields } from "../../../common/components/homeowner-visit-fields.tsx";
import { useCreateFollowUp } from "../../../common/api/create-follow-up.ts";
import { useCustomerSearch } from "../../../common/api/search-customers.ts";
import { emptyNewFollowUp, newFollowUpFields, toNewFollowUpBody, type NewFollowUpValues } from "../lib/new-follow-up-form.ts";

export interface AddFollowUpDialogProps {
  staff: readonly TeamMember[];
  onClose: () => void;
  onAdded: (followUp: FollowUp) => void;
}

/** A follow-up for any lawn of the company, not only from a question: find the customer, then book. */
export function AddFollowUpDialog({ staff, onClose, onAdded }: AddFollowUpDialogProps) {
  return (
    <Dialog open onClose={onClose} title="Add a follow-up visit" description="Find the customer, pick the lawn, and say when and why.">
      <AddFollowUpForm staff={staff} onCancel={onClose} onAdded={onAdded} />
    </Dialog>
  );
}

function AddFollowUpForm({ staff, onCancel, onAdded }: { staff: readonly TeamMember[]; onCancel: () => void; onAdded: (followUp: FollowUp) => void }) {
  const user = useSignedInUser();
  const create = useCreateFollowUp();
  const [customer, setCustomer] = useState<CustomerSummary | null>(null);
  const [formMessage, setFormMessage] = useState<string | null>(null);
  const { register, handleSubmit, setError, setValue, watch, formState, clearErrors } = useForm<NewFollowUpValues>({
    defaultValues: { ...emptyNewFollowUp, technicianId: user.role === "technician" ? String(user.id) : "" },
  });
  const errors = formState.errors;

  // Technicians can't list the team, so they book for themselves or leave it to the manager.
  const others = staff.filter((m) => m.active && m.id !== user.id).map((m) => ({ value: String(m.id), label: m.name }));
  const technicianOptions = [{ value: String(user.id), label: `Me (${user.name})` }, ...others];

  const pick = (picked: CustomerSummary | null) => {
    setCustomer(picked);
    setValue("propertyId", picked?.properties.length === 1 ? String(picked.properties[0]!.id) : "");
    clearErrors("propertyId");
  };

  const submit = handleSubmit((values) => {
    setFormMessage(null);
    const checked = toNewFollowUpBody(values);
    if (!checked.ok) {
      for (const [field, message] of Object.entries(checked.fields)) setError(field as keyof NewFollowUpValues, { type: "schema", message });
      return;
    }
    create.mutate(checked.body, {
      onSuccess: onAdded,
      onError: (error) => setFormMessage(applyServerErrors(error, setError, newFollowUpFields)),
    });
  });

  return (
    <form noValidate onSubmit={(e) => void submit(e)} className="flex flex-col gap-4">
      {formMessage && (
        <Notice tone="danger" title="The follow-up visit wasn't added">
          {formMessage}
        </Notice>
      )}
      {customer ? (
        <div className="flex flex-col gap-2 rounded-lg border-2 border-line p-3">
          <p className="font-semibold">
            {customer.firstName} {customer.lastName}
            {customer.externalRef ? ` · ${customer.externalRef}` : ""}
          </p>
          {customer.properties.length > 1 ? (
            <SelectField
              label="Which lawn?"
              placeholderOption="Pick the lawn"
              options={customer.properties.map((p) => ({ value: String(p.id), label: `${p.street}, ${p.town}` }))}
              error={errors.propertyId?.message}
              {...register("propertyId")}
            />
          ) : (
            <p>{customer.properties[0] ? `${customer.properties[0].street}, ${customer.properties[0].town}` : "This customer has no lawn on file."}</p>
          )}
          <Button variant="quiet" className="self-start" onClick={() => pick(null)}>
            Pick another customer
          </Button>
        </div>
      ) : (
        <CustomerPicker error={errors.propertyId?.message} onPick={pick} />
      )}
      <SelectField
        label="Why is a visit needed?"
        placeholderOption="Pick a reason"
        error={errors.reason?.message}
        options={FOLLOW_UP_REASONS.map((reason) => ({ value: reason, label: followUpReasonLabels[reason] }))}
        {...register("reason")}
      />
      <TextAreaField label="What you know (optional)" rows={2} error={errors.reasonNote?.message} {...register("reasonNote")} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Date (optional)" type="date" min={localToday()} error={errors.scheduledFor?.message} {...register("scheduledFor")} />
        <SelectField label="Technician" placeholderOption="Not assigned yet" error={errors.technicianId?.message} options={technicianOptions} {...register("technicianId")} />
      </div>
      <p className="-mt-2 text-base text-ink-soft">With a date and a technician it is booked and the homeowner is told; otherwise it waits as requested.</p>
      <HomeownerVisitFields
        start={{ error: errors.arrivalStart?.message, ...register("arrivalStart") }}
        end={{ error: errors.arrivalEnd?.message, ...register("arrivalEnd") }}
        prep={{ error: errors.customerPrep?.message, ...register("customerPrep") }}
        reason={watch("reason") as FollowUpReason | ""}
        onSuggest={(text) => setValue("customerPrep", text, { shouldDirty: true })}
      />
      <CheckboxField label="This is a callback" hint="A free return visit because the result failed." {...register("isCallback")} />
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" pending={create.isPending} pendingLabel="Adding…">
          Add follow-up visit
        </Button>
      </div>
    </form>
  );
}

/** Search as you type; each match is a button, so the list works from the keyboard. */
function CustomerPicker({ error, onPick }: { error: string | undefined; onPick: (customer: CustomerSummary) => void }) {
  const [text, setText] = useState("");
  const q = useDebouncedValue(text, 250);
  const search = useCustomerSearch(q);
  const results = q.trim() ? (search.data ?? []) : [];
  return (
    <div className="flex flex-col gap-2">
      <TextField
        label="Customer"
        hint="Name, street, phone, e-mail or customer number."
        type="search"
        autoComplete="off"
        value={text}
        error={error}
        onChange={(e) => setText(e.target.value)}
      />
      {search.isError && <Notice tone="danger">The search didn't work. Try again in a moment.</Notice>}
      {q.trim() && search.isFetching && results.length === 0 && <p className="text-ink-soft">Searching…</p>}
      {q.trim() && !search.isFetching && search.isSuccess && results.length === 0 && <p className="text-ink-soft">No customer matches “{q.trim()}”.</p>}
      {results.length > 0 && (
        <ul aria-label="Matching customers" className="flex flex-col gap-1">
          {results.map((c) => (
            <li key={c.id}>
              <button
                type="button"
                onClick={() => onPick(c)}
                className="min-h-11 w-full rounded-lg border border-line px-3 py-2 text-left hover:bg-pine-100 focus-visible:outline-3"
              >
                <span className="font-semibold">
                  {c.firstName} {c.lastName}
                </span>
                <span className="block text-base text-ink-soft">{c.properties.map((p) => p.street).join(" · ") || "No lawn on file"}</span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
