import { Outlet } from "react-router-dom";
import type { CurrentUser } from "#shared/schemas/auth";
import { AppShell, Page, SignOutButton, buttonClasses, useMe } from "#shared/ui/index";
import { productLabel } from "./product.ts";

/** Sign-in pages: no account controls. */
export function PublicLayout() {
  return (
    <AppShell productLabel={productLabel}>
      <Outlet />
    </AppShell>
  );
}

/** Pages behind sign-in: the header offers sign out once we know who is here. */
export function SignedInLayout() {
  const { data: user } = useMe();
  return (
    <AppShell productLabel={productLabel} actions={user ? <SignOutButton /> : undefined}>
      <Outlet />
    </AppShell>
  );
}

/** A staff member who opened the homeowner portal: point them to their own app. */
export function StaffOnPortal({ user }: { user: CurrentUser }) {
  return (
    <Page title="This is the homeowner portal" intro={`You're signed in as ${user.name}, a member of staff at ${user.companyName}.`}>
      <a href="/staff/" className={buttonClasses("primary")}>
        Open the staff app
      </a>
    </Page>
  );
}
