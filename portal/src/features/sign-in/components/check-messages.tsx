import { Trans, useTranslation } from "react-i18next";
import { Button } from "#shared/ui/index";

export interface CheckMessagesProps {
  contact: string;
  onUseAnother: () => void;
}

/** Worded the same whether or not the contact is on file, so it can't be used to probe for accounts. */
export function CheckMessages({ contact, onUseAnother }: CheckMessagesProps) {
  const { t } = useTranslation();
  return (
    <section aria-labelledby="check-messages-heading" className="rounded-xl border-2 border-pine-700 bg-pine-50 p-5" role="status">
      <h2 id="check-messages-heading" className="text-2xl text-pine-900">
        {t("signIn.checkTitle")}
      </h2>
      <p className="mt-2">
        <Trans i18nKey="signIn.checkBody" values={{ contact }} components={{ strong: <strong className="[overflow-wrap:anywhere]" /> }} />
      </p>
      <ul className="mt-3 list-disc space-y-1 pl-5 text-ink-soft">
        <li>{t("signIn.checkTipOpen")}</li>
        <li>{t("signIn.checkTipOnce")}</li>
        <li>{t("signIn.checkTipNothing")}</li>
      </ul>
      <Button variant="secondary" className="mt-4" onClick={onUseAnother}>
        {t("signIn.askAnother")}
      </Button>
    </section>
  );
}
