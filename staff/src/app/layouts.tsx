import { Link, Outlet, useNavigation } from "react-router-dom";
import { staffRoles, type CurrentUser } from "#shared/schemas/auth";
import { AppShell, LoadingState, Page, RequireRole, SignOutButton, SignOutEverywhereButton, buttonClasses, useMe, type NavItem } from "#shared/ui/index";
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

/** Manager screens; technicians don't see them in the navigation. */
const managerNav: NavItem[] = [
  { to: "/follow-ups", label: "Follow-ups" },
  { to: "/unmatched", label: "Unmatched messages" },
  { to: "/reports/callbacks", label: "Callback report" },
  { to: "/programs", label: "Programs" },
  { to: "/team", label: "Team" },
  { to: "/company", label: "Company profile" },
  { to: "/import", label: "Import" },
  { to: "/audit", label: "Audit log" },
];

/** Signed-in staff pages: main navigation (a menu on phones) and sign out. */
export function StaffLayout() {
  const { data: user } = useMe();
  const isStaff = Boolean(user && staffRoles.includes(user.role));
  const outboxAvailable = useOutboxAvailable(isStaff);

  // Technicians and managers alike: every staff role may try out a plan.
  const nav: NavItem[] = [
    { to: "/", label: "Home", end: true },
    { to: "/questions", label: "Questions" },
    { to: "/visits/new", label: "Log a visit" },
    { to: "/customers", label: "Customers" },
    { to: "/plan-preview", label: "Plan preview" },
    // Managers edit the rules; technicians read what applies where they work.
    { to: "/places", label: "Places" },
    { to: "/sources", label: "Sources to check" },
  ];
  if (user?.role === "manager") nav.push(...managerNav);
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
            {/* Staff only: in the narrow header a homeowner who strayed here sees, the plain sign-out is enough. */}
            {isStaff && <SignOutEverywhereButton />}
          </>
        ) : undefined
      }
    >
      <NavigationProgress />
      <Outlet />
    </AppShell>
  );
}

/** Screens load on first visit; a thin bar says something is happening meanwhile. */
function NavigationProgress() {
  const navigation = useNavigation();
  if (navigation.state === "idle") return null;
  return (
    <div role="status" className="fixed inset-x-0 top-0 z-50 h-1 animate-pulse bg-pine-700">
      <span className="sr-only">Loading…</span>
    </div>
  );
}

/** Shown while the first screen of a visit downloads. */
export function StaffLoading() {
  return <LoadingState label="Loading…" />;
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

/** Layout route for manager screens: a technician who opens one by address gets a plain explanation. */
export function ManagersOnly() {
  return (
    <RequireRole
      roles={["manager"]}
      deniedTitle="Managers only"
      deniedMessage="This page is for managers of your company. Ask a manager if you need something from it."
      deniedAction={
        <Link to="/" className={buttonClasses("primary")}>
          Go to the start page
        </Link>
      }
    />
  );
}
