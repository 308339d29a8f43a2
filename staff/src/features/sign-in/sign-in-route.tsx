import { Navigate, useSearchParams } from "react-router-dom";
import { staffRoles } from "#shared/schemas/auth";
import { Page, buttonClasses, useMe } from "#shared/ui/index";
import { SignInError } from "./components/sign-in-error.tsx";

export function SignInRoute() {
  const [searchParams] = useSearchParams();
  const error = searchParams.get("error");
  const me = useMe();

  if (me.data && staffRoles.includes(me.data.role)) return <Navigate to="/" replace />;

  return (
    <Page title="Staff sign-in" heading="Staff sign-in" intro="Technicians and managers sign in with the Google account their company invited.">
      <div className="flex flex-col gap-5">
        {error && <SignInError code={error} />}
        {/* A full page load: the server starts the Google sign-in and redirects back to /staff/. */}
        <a href="/auth/google" className={buttonClasses("primary", "w-full sm:w-auto sm:self-start")}>
          <GoogleGlyph />
          Sign in with Google
        </a>
        <p className="text-ink-soft">
          Looking for your lawn's care plan? <a href="/portal/sign-in">Homeowners sign in here</a>.
        </p>
      </div>
    </Page>
  );
}

/** A plain "G" in a circle: says which account to use without copying anyone's branded button. */
function GoogleGlyph() {
  return (
    <span aria-hidden="true" className="inline-flex size-6 items-center justify-center rounded-full bg-white text-sm font-bold text-pine-800">
      G
    </span>
  );
}
