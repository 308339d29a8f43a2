import { useTranslation } from "react-i18next";
import { SignOutEverywhereButton } from "#shared/ui/index";
import { useErrorText } from "../../../common/lib/use-error-text.ts";

/** For a lost phone or a shared computer: ends the homeowner's sessions on every device, after asking. */
export function SignOutEverywhere() {
  const { t } = useTranslation();
  const errorText = useErrorText();
  return (
    <div className="flex flex-col items-start gap-2">
      <p className="text-ink-soft">{t("settings.account.everywhere.intro")}</p>
      <SignOutEverywhereButton
        variant="secondary"
        errorText={errorText}
        words={{
          button: t("settings.account.everywhere.button"),
          title: t("settings.account.everywhere.title"),
          explanation: t("settings.account.everywhere.explanation"),
          confirm: t("settings.account.everywhere.confirm"),
          pending: t("settings.account.everywhere.pending"),
          cancel: t("settings.account.everywhere.cancel"),
        }}
      />
    </div>
  );
}
