import { zodResolver } from "@hookform/resolvers/zod";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import { useTranslation } from "react-i18next";
import { allowedReminderWindow, preferencesSchema, type PreferencesResponse } from "#shared/schemas/preferences";
import { Button, Notice, TextField, applyServerErrors } from "#shared/ui/index";
import { useErrorText } from "../../../common/lib/use-error-text.ts";
import { useUpdatePreferences } from "../api/update-preferences.ts";
import { ChoiceGroup } from "./choice-group.tsx";

const reminderSchema = preferencesSchema.pick({ channels: true, dailyTime: true, wateringNudges: true });
type ReminderValues = Pick<PreferencesResponse["preferences"], "channels" | "dailyTime" | "wateringNudges">;

const channels = ["sms", "email", "both", "none"] as const;

/** How and when reminders come. Language and units are saved by their own controls. */
export function ReminderForm({ saved }: { saved: PreferencesResponse }) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const update = useUpdatePreferences();
  const nudgesId = useId();
  const [formError, setFormError] = useState<string | null>(null);
  const { preferences, optedOut } = saved;
  const form = useForm<ReminderValues>({
    resolver: zodResolver(reminderSchema),
    defaultValues: { channels: preferences.channels, dailyTime: preferences.dailyTime, wateringNudges: preferences.wateringNudges },
  });

  const onSubmit = form.handleSubmit((values) => {
    setFormError(null);
    update.mutate(
      { ...preferences, ...values },
      {
        onSuccess: (result) => form.reset({ channels: result.preferences.channels, dailyTime: result.preferences.dailyTime, wateringNudges: result.preferences.wateringNudges }),
        onError: (error) => setFormError(applyServerErrors(error, form.setError, ["channels", "dailyTime", "wateringNudges"]) && errorText(error)),
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5">
      <ChoiceGroup
        legend={t("settings.reminders.channelsLegend")}
        choices={channels.map((value) => ({ value, label: t(`settings.reminders.channel.${value}`) }))}
        inputProps={form.register("channels")}
      />
      {optedOut.length > 0 && (
        <Notice tone="warning">
          {t("settings.reminders.optedOut", { channels: optedOut.map((c) => t(`settings.reminders.optedOutChannel.${c}`)).join(", ") })}
        </Notice>
      )}
      <TextField
        label={t("settings.reminders.dailyTime")}
        hint={t("settings.reminders.dailyTimeHint")}
        type="time"
        min={allowedReminderWindow.earliest}
        max={allowedReminderWindow.latest}
        step={900}
        className="max-w-xs"
        error={form.formState.errors.dailyTime && t("settings.reminders.dailyTimeRange")}
        {...form.register("dailyTime")}
      />
      <div className="flex items-start gap-3">
        <input id={nudgesId} type="checkbox" className="mt-1 size-6 shrink-0 accent-pine-700" aria-describedby={`${nudgesId}-hint`} {...form.register("wateringNudges")} />
        <div>
          <label htmlFor={nudgesId} className="font-semibold">
            {t("settings.reminders.wateringNudges")}
          </label>
          <p id={`${nudgesId}-hint`} className="text-base text-ink-soft">
            {t("settings.reminders.wateringNudgesHint")}
          </p>
        </div>
      </div>
      {formError && <Notice tone="danger">{formError}</Notice>}
      {update.isSuccess && !form.formState.isDirty && <Notice tone="success">{t("settings.reminders.saved")}</Notice>}
      <Button type="submit" pending={update.isPending} pendingLabel={t("common.saving")} className="self-start">
        {t("settings.reminders.save")}
      </Button>
    </form>
  );
}
