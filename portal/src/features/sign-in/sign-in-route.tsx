import { useState } from "react";
import { useTranslation } from "react-i18next";
import { Navigate } from "react-router-dom";
import { Page, useMe } from "#shared/ui/index";
import { CheckMessages } from "./components/check-messages.tsx";
import { RequestLinkForm } from "./components/request-link-form.tsx";

export function SignInRoute() {
  const { t } = useTranslation();
  const me = useMe();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [lastContact, setLastContact] = useState("");

  if (me.data?.role === "customer") return <Navigate to="/" replace />;

  return (
    <Page title={t("signIn.title")} heading={t("signIn.heading")} intro={t("signIn.intro")}>
      {sentTo ? (
        <CheckMessages
          contact={sentTo}
          onUseAnother={() => {
            setLastContact(sentTo);
            setSentTo(null);
          }}
        />
      ) : (
        <RequestLinkForm defaultContact={lastContact} onSent={setSentTo} />
      )}
    </Page>
  );
}
