import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button, Notice, TextField, applyServerErrors } from "#shared/ui/index";
import { useUpdateCompanyProfile } from "../api/update-phone.ts";

type PhoneValues = { phone: string };

/** The office number, as the manager would say it; the server reads it and saves it in international form. */
export function PhoneForm({ phone }: { phone: string | null }) {
  const { register, handleSubmit, setError, reset, formState } = useForm<PhoneValues>({ defaultValues: { phone: phone ?? "" } });
  const update = useUpdateCompanyProfile();
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null | undefined>(undefined);

  const submit = handleSubmit(({ phone: typed }) => {
    setFormError(null);
    setSaved(undefined);
    update.mutate(
      { phone: typed.trim() === "" ? null : typed },
      {
        onSuccess: (company) => {
          setSaved(company.phone);
          reset({ phone: company.phone ?? "" });
        },
        onError: (error) => setFormError(applyServerErrors(error, setError, ["phone"])),
      },
    );
  });

  return (
    <section aria-labelledby="phone-heading" className="rounded-xl border border-line bg-surface p-4">
      <h2 id="phone-heading" className="text-2xl text-pine-900">
        Office phone
      </h2>
      <p className="mt-1 text-ink-soft">Homeowners see it at the top of their portal and on the printed plan, and can tap to call or text it.</p>
      <form noValidate onSubmit={(e) => void submit(e)} className="mt-4 flex flex-col gap-4">
        {formError && <Notice tone="danger">{formError}</Notice>}
        {saved !== undefined && (
          <Notice tone="success">{saved ? `Saved. Homeowners now see ${saved}.` : "Removed. Homeowners no longer see a phone number."}</Notice>
        )}
        <TextField
          label="Phone number"
          type="tel"
          autoComplete="tel"
          hint="With the area code, e.g. (330) 555-0100. Leave empty to hide it."
          error={formState.errors.phone?.message}
          {...register("phone")}
        />
        <Button type="submit" className="self-start" pending={update.isPending} pendingLabel="Saving…">
          Save phone number
        </Button>
      </form>
    </section>
  );
}
