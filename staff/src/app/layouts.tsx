import { Outlet } from "react-router-dom";
import { staffRoles, type CurrentUser } from "#shared/schemas/auth";
import { AppShell, Page, SignOutButton, buttonClasses, useMe, type NavItem } from "#shared/ui/index";
import { useOutboxAvailable } from "../features/outbox/api/get-outbox.ts";
import { productLabel } from "./product.ts";

/** The sign-in page: no navigation until we know who is here. */
export function PublicLayout() {
  return (
    <AppShell productLabel={productLabel}>
      <Outlet />
    </AppShell>
  );
}

/** Signed-in staff pages: main navigation (a menu on phones) and sign out. */
export function StaffLayout() {
  const { data: user } = useMe();
  const isStaff = Boolean(user && staffRoles.includes(user.role));
  const outboxAvailable = useOutboxAvailable(isStaff);

  // Technicians and managers alike: every staff role may try out a plan.
  const nav: NavItem[] = [
    { to: "/", label: "Home", end: true },
    { to: "/plan-preview", label: "Plan preview" },
  ];
  if (outboxAvailable) nav.push({ to: "/outbox", label: "Outbox (development)" });

  return (
    <AppShell
      productLabel={productLabel}
      nav={isStaff ? nav : undefined}
      actions={
        user ? (
          <>
            <span className="text-ink-soft">{user.name}</span>
            <SignOutButton />
          </>
        ) : undefined
      }
    >
      <Outlet />
    </AppShell>
  );
}

/** A homeowner who opened the staff app: point them to the portal. */
export function CustomerOnStaff({ user }: { user: CurrentUser }) {
  return (
    <Page title="This is the staff app" intro={`You're signed in as ${user.name}. Your care plan is in the homeowner portal.`}>
      <a href="/portal/" className={buttonClasses("primary")}>
        Open my care plan
      </a>
    </Page>
  );
}
