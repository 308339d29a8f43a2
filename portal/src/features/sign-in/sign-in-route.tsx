import { useState } from "react";
import { useTranslation } from "react-i18next";
import { Navigate, useSearchParams } from "react-router-dom";
import { portalRouterPath, safePortalNext } from "#shared/schemas/next-path";
import { Page, useMe } from "#shared/ui/index";
import { CheckMessages } from "./components/check-messages.tsx";
import { RequestLinkForm } from "./components/request-link-form.tsx";

export function SignInRoute() {
  const { t } = useTranslation();
  const me = useMe();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [lastContact, setLastContact] = useState("");
  // A link opened signed out brought the person here; the link we send returns them to it.
  const next = safePortalNext(useSearchParams()[0].get("next")) ?? undefined;

  if (me.data?.role === "customer") return <Navigate to={next ? portalRouterPath(next) : "/"} replace />;

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
        <RequestLinkForm defaultContact={lastContact} next={next} onSent={setSentTo} />
      )}
    </Page>
  );
}
