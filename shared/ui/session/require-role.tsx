import type { ReactNode } from "react";
import { Outlet } from "react-router-dom";
import type { Role } from "#shared/schemas/auth";
import { Page } from "../page.tsx";
import { useMe } from "./get-me.ts";

export interface RequireRoleProps {
  roles: readonly Role[];
  /** The page shown to anyone else, e.g. "Managers only". */
  deniedTitle: string;
  deniedMessage: ReactNode;
  /** A way on, e.g. a link to the start page. */
  deniedAction?: ReactNode;
}

/**
 * Layout route inside <RequireSignIn>: renders its child routes only for the given roles.
 * The server refuses the data anyway (403); this says so plainly instead of an error box.
 */
export function RequireRole({ roles, deniedTitle, deniedMessage, deniedAction }: RequireRoleProps) {
  const { data: user } = useMe();
  if (user && roles.includes(user.role)) return <Outlet />;
  return (
    <Page title={deniedTitle} intro={deniedMessage}>
      {deniedAction}
    </Page>
  );
}
