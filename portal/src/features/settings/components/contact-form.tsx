import { useState } from "react";
import { useForm } from "react-hook-form";
import { useTranslation } from "react-i18next";
import { useSearchParams } from "react-router-dom";
import { contactChangeSchema, type PreferencesResponse } from "#shared/schemas/preferences";
import { Button, Notice, TextField, applyServerErrors } from "#shared/ui/index";
import { useErrorText } from "../../../common/lib/use-error-text.ts";
import { useRequestContactChange, type ContactChange } from "../api/change-contact.ts";

interface ContactValues {
  email: string;
  phone: string;
}

/** Empty boxes mean "no change", not "remove": the API wants them left out. */
function toChange({ email, phone }: ContactValues): Partial<ContactChange> {
  return { ...(email.trim() ? { email: email.trim() } : {}), ...(phone.trim() ? { phone: phone.trim() } : {}) };
}

/** A new e-mail address or number only counts once it is confirmed through a link sent to it. */
export function ContactForm({ current }: { current: PreferencesResponse["contact"] | undefined }) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const change = useRequestContactChange();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<ContactValues>({ defaultValues: { email: "", phone: "" } });
  // Set when the person arrives from the confirmation link: "confirmed" or why it didn't work.
  const [searchParams] = useSearchParams();
  const outcome = searchParams.get("contact");

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    const parsed = contactChangeSchema.safeParse(toChange(values));
    if (!parsed.success) {
      let placed = false;
      for (const issue of parsed.error.issues) {
        const field = issue.path[0];
        if (field === "email" || field === "phone") {
          form.setError(field, { message: issue.message }, { shouldFocus: !placed });
          placed = true;
        }
      }
      if (!placed) setFormError(t("settings.contact.needOne"));
      return;
    }
    change.mutate(parsed.data, {
      onSuccess: () => form.reset(),
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ["email", "phone"]) && errorText(error)),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {outcome === "confirmed" && <Notice tone="success">{t("settings.contact.confirmed")}</Notice>}
      {outcome && outcome !== "confirmed" && <Notice tone="warning">{t("settings.contact.confirmFailed")}</Notice>}
      <p>{t("settings.contact.explain")}</p>
      {current && (
        <p className="text-ink-soft">
          {t("settings.contact.current", { email: current.email ?? t("settings.contact.none"), phone: current.phone ?? t("settings.contact.none") })}
        </p>
      )}
      <TextField label={t("settings.contact.email")} type="email" autoComplete="email" inputMode="email" autoCapitalize="none" spellCheck={false} error={form.formState.errors.email?.message} {...form.register("email")} />
      <TextField label={t("settings.contact.phone")} type="tel" autoComplete="tel" inputMode="tel" error={form.formState.errors.phone?.message} {...form.register("phone")} />
      {formError && <Notice tone="danger">{formError}</Notice>}
      {change.isSuccess && <Notice tone="success">{t("settings.contact.sent")}</Notice>}
      <Button type="submit" variant="secondary" pending={change.isPending} pendingLabel={t("common.saving")} className="self-start">
        {t("settings.contact.submit")}
      </Button>
    </form>
  );
}
