import { useState } from "react";
import { Navigate } from "react-router-dom";
import { Page, useMe } from "#shared/ui/index";
import { CheckMessages } from "./components/check-messages.tsx";
import { RequestLinkForm } from "./components/request-link-form.tsx";

export function SignInRoute() {
  const me = useMe();
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [lastContact, setLastContact] = useState("");

  if (me.data?.role === "customer") return <Navigate to="/" replace />;

  return (
    <Page title="Sign in" heading="Sign in to your care plan" intro="No password needed: we'll send you a link that signs you in.">
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
