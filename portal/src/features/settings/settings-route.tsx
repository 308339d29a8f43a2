import { useTranslation } from "react-i18next";
import { ErrorState, LoadingState, Page } from "#shared/ui/index";
import { usePreferences } from "../../common/api/get-preferences.ts";
import { Section } from "../../common/components/section.tsx";
import { PortalSignOutButton } from "../../common/components/sign-out-button.tsx";
import { isNotFound, useErrorText } from "../../common/lib/use-error-text.ts";
import { CalendarFeed } from "./components/calendar-feed.tsx";
import { ContactForm } from "./components/contact-form.tsx";
import { DisplayChoices } from "./components/display-choices.tsx";
import { ReminderForm } from "./components/reminder-form.tsx";
import { SignOutEverywhere } from "./components/sign-out-everywhere.tsx";

export function SettingsRoute() {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const preferences = usePreferences();

  return (
    <Page title={t("settings.title")} intro={t("settings.intro")}>
      <Section title={t("settings.reminders.heading")}>
        {preferences.data ? (
          <ReminderForm saved={preferences.data} />
        ) : preferences.isPending ? (
          <LoadingState label={t("settings.loading")} />
        ) : (
          <ErrorState
            title={isNotFound(preferences.error) ? t("settings.notAvailableTitle") : t("settings.loadError")}
            error={preferences.error}
            message={isNotFound(preferences.error) ? t("settings.notAvailableBody") : errorText(preferences.error)}
            onRetry={() => void preferences.refetch()}
            retrying={preferences.isFetching}
            retryLabel={t("common.tryAgain")}
            retryingLabel={t("common.tryingAgain")}
          />
        )}
      </Section>

      <Section title={t("settings.display.heading")}>
        <DisplayChoices saved={preferences.data} />
      </Section>

      <Section title={t("settings.contact.heading")}>
        <ContactForm current={preferences.data?.contact} />
      </Section>

      <Section title={t("settings.calendar.heading")}>
        <CalendarFeed />
      </Section>

      <Section title={t("settings.account.heading")}>
        <div className="flex flex-col items-start gap-5">
          <PortalSignOutButton />
          <SignOutEverywhere />
        </div>
      </Section>
    </Page>
  );
}
