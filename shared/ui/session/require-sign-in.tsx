import type { ReactNode } from "react";
import { Navigate, Outlet, useHref, useLocation } from "react-router-dom";
import type { CurrentUser, Role } from "#shared/schemas/auth";
import { ErrorState, LoadingState } from "../states.tsx";
import { useMe } from "./get-me.ts";

export interface RequireSignInProps {
  /** Where to send someone who isn't signed in, relative to the router basename. */
  signInPath: string;
  /** Roles this app is for; anyone else sees `wrongRole`. */
  allowedRoles: readonly Role[];
  /** Shown to a signed-in person whose role this app isn't for (e.g. a homeowner on the staff app). */
  wrongRole: (user: CurrentUser) => ReactNode;
  /** Send the page asked for along as `?next=` (full path, basename included), so sign-in can return to it. */
  keepTarget?: boolean;
}

/** Layout route: renders its child routes only for a signed-in person with an allowed role. */
export function RequireSignIn({ signInPath, allowedRoles, wrongRole, keepTarget = false }: RequireSignInProps) {
  const me = useMe();
  const location = useLocation();
  const target = useHref(location);
  if (me.isPending) return <LoadingState label="Checking your sign-in…" />;
  if (me.isError) {
    return (
      <div className="mx-auto max-w-xl">
        <ErrorState title="We couldn't check your sign-in" error={me.error} onRetry={() => void me.refetch()} retrying={me.isFetching} />
      </div>
    );
  }
  if (!me.data) return <Navigate to={keepTarget ? `${signInPath}?next=${encodeURIComponent(target)}` : signInPath} replace />;
  if (!allowedRoles.includes(me.data.role)) return <>{wrongRole(me.data)}</>;
  return <Outlet />;
}
