import { useTranslation } from "react-i18next";
import { Button, useSignOut } from "#shared/ui/index";
import { useErrorText } from "../lib/use-error-text.ts";

/** Signs out; the offline copy on this device goes with the session (`dropSavedCopyOnSignOut`). */
export function PortalSignOutButton({ className = "" }: { className?: string }) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const signOut = useSignOut();
  return (
    <span className={`inline-flex flex-col items-start gap-1 ${className}`}>
      <Button
        variant="secondary"
        onClick={() => signOut.mutate()}
        pending={signOut.isPending}
        pendingLabel={t("account.signingOut")}
      >
        {t("account.signOut")}
      </Button>
      {signOut.isError && (
        <span role="alert" className="text-sm font-semibold text-rust-700">
          {errorText(signOut.error)}
        </span>
      )}
    </span>
  );
}
