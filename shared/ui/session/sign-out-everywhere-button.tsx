import { useState } from "react";
import { Button, type ButtonVariant } from "../button.tsx";
import { ConfirmDialog } from "../confirm-dialog.tsx";
import { errorMessage } from "../api-client.ts";
import { useSignOutEverywhere } from "./sign-out.ts";

export interface SignOutEverywhereWords {
  button: string;
  title: string;
  explanation: string;
  confirm: string;
  pending: string;
  cancel: string;
}

/** The staff app's words; the portal passes its own translated ones. */
const englishWords: SignOutEverywhereWords = {
  button: "Sign out everywhere",
  title: "Sign out on every device?",
  explanation:
    "Every phone, tablet and computer signed in to your account is signed out, this one too, and sign-in links you have not used yet stop working. Use this if you lost a device or signed in on someone else's.",
  confirm: "Sign out everywhere",
  pending: "Signing out…",
  cancel: "Cancel",
};

/**
 * Asks first, since it also signs out devices the person isn't holding; then the route guard
 * shows the sign-in page, as after an ordinary sign-out.
 */
export function SignOutEverywhereButton({
  words = englishWords,
  variant = "quiet",
  errorText = errorMessage,
}: {
  words?: SignOutEverywhereWords;
  variant?: ButtonVariant;
  errorText?: (error: unknown) => string;
}) {
  const [open, setOpen] = useState(false);
  const signOut = useSignOutEverywhere();
  return (
    <>
      <Button variant={variant} onClick={() => setOpen(true)}>
        {words.button}
      </Button>
      <ConfirmDialog
        open={open}
        title={words.title}
        confirmLabel={words.confirm}
        pendingLabel={words.pending}
        cancelLabel={words.cancel}
        variant="danger"
        pending={signOut.isPending}
        error={signOut.isError ? errorText(signOut.error) : null}
        onConfirm={() => signOut.mutate()}
        onCancel={() => {
          setOpen(false);
          signOut.reset();
        }}
      >
        <p>{words.explanation}</p>
      </ConfirmDialog>
    </>
  );
}
