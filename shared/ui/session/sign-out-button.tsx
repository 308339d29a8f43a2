import { Button, type ButtonVariant } from "../button.tsx";
import { errorMessage } from "../api-client.ts";
import { useSignOut } from "./sign-out.ts";

/** Signs out; the route guard then shows the sign-in page. */
export function SignOutButton({ variant = "secondary" }: { variant?: ButtonVariant }) {
  const signOut = useSignOut();
  return (
    <span className="inline-flex flex-col items-start gap-1">
      <Button variant={variant} onClick={() => signOut.mutate()} pending={signOut.isPending} pendingLabel="Signing out…">
        Sign out
      </Button>
      {signOut.isError && (
        <span role="alert" className="text-sm font-semibold text-rust-700">
          {errorMessage(signOut.error)}
        </span>
      )}
    </span>
  );
}
