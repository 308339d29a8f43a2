import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { useTranslation } from "react-i18next";
import { signInLinkRequestSchema, type SignInLinkRequest } from "#shared/schemas/auth";
import { Button, Notice, TextField, applyServerErrors } from "#shared/ui/index";
import { useRequestSignInLink } from "../api/request-link.ts";

export interface RequestLinkFormProps {
  defaultContact?: string;
  /** The portal page the link should return to (already checked to be one). */
  next?: string;
  onSent: (contact: string) => void;
}

export function RequestLinkForm({ defaultContact = "", next, onSent }: RequestLinkFormProps) {
  const { t } = useTranslation();
  const requestLink = useRequestSignInLink();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<SignInLinkRequest>({
    resolver: zodResolver(signInLinkRequestSchema),
    defaultValues: { contact: defaultContact },
  });

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    requestLink.mutate(next ? { ...values, next } : values, {
      onSuccess: () => onSent(values.contact),
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ["contact"])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <TextField
        label={t("signIn.contactLabel")}
        hint={t("signIn.contactHint")}
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        error={form.formState.errors.contact?.message}
        {...form.register("contact")}
      />
      {formError && <Notice tone="danger">{formError}</Notice>}
      <Button type="submit" pending={requestLink.isPending} pendingLabel={t("signIn.sending")} className="w-full sm:w-auto sm:self-start">
        {t("signIn.send")}
      </Button>
    </form>
  );
}
