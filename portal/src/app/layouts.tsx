import { useEffect } from "react";
import { useTranslation } from "react-i18next";
import { Navigate, Outlet, useLocation, useNavigation } from "react-router-dom";
import type { CurrentUser } from "#shared/schemas/auth";
import { LoadingState, Page, buttonClasses, useMe } from "#shared/ui/index";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { preferencesQueryOptions } from "../common/api/get-preferences.ts";
import { PortalSignOutButton } from "../common/components/sign-out-button.tsx";
import { applyLanguage } from "../i18n/index.ts";
import { setUnits } from "../common/lib/units.ts";
import { whenSettled } from "../common/lib/when-idle.ts";
import { useCompany } from "../common/api/get-company.ts";
import { useUnread } from "../common/api/get-unread.ts";
import { CompanyBrand, OfficeContact } from "./company-brand.tsx";
import { PortalShell } from "./portal-shell.tsx";

/** Sign-in pages: no navigation and no account controls. */
export function PublicLayout() {
  return (
    <PortalShell showNav={false}>
      <Outlet />
    </PortalShell>
  );
}

/** Pages behind sign-in: navigation, sign out, and the homeowner's saved language. */
export function SignedInLayout() {
  const { data: user } = useMe();
  const isCustomer = user?.role === "customer";
  useSavedDisplayChoices(isCustomer);
  usePrefetchReadingScreens();
  const { data: company } = useCompany(Boolean(user));
  const { data: unread } = useUnread(isCustomer);
  return (
    <PortalShell
      actions={user ? <PortalSignOutButton /> : undefined}
      brand={company ? <CompanyBrand company={company} /> : undefined}
      headerStrip={isCustomer ? <OfficeContact company={company} /> : undefined}
      unreadMessages={unread?.total ?? 0}
    >
      <NavigationProgress />
      <Outlet />
    </PortalShell>
  );
}

/** Applies the language and units saved on the server, which win over this device's guess. */
function useSavedDisplayChoices(enabled: boolean) {
  const { data } = useQuery({ ...preferencesQueryOptions(), enabled });
  const { i18n } = useTranslation();
  const savedLanguage = data?.preferences.language;
  const savedUnits = data?.preferences.units;
  useEffect(() => {
    if (savedLanguage && savedLanguage !== i18n.language) void applyLanguage(savedLanguage);
  }, [savedLanguage, i18n.language]);
  useEffect(() => {
    if (savedUnits) setUnits(savedUnits);
  }, [savedUnits]);
}

/**
 * The reading screens (Plan, Messages) are fetched once the first screen's requests are done
 * and the phone is idle, so they still open after the signal drops in the garden without
 * slowing down the first screen. Ask and Settings need a connection anyway.
 */
function usePrefetchReadingScreens() {
  const queryClient = useQueryClient();
  useEffect(
    () =>
      whenSettled(queryClient, () => {
        void import("../features/plan/plan-route.tsx");
        void import("../features/messages/messages-route.tsx");
      }),
    [queryClient],
  );
}

/** Lazy screens load on first visit; a thin bar says something is happening meanwhile. */
function NavigationProgress() {
  const { t } = useTranslation();
  const navigation = useNavigation();
  if (navigation.state === "idle") return null;
  return (
    <div role="status" className="fixed inset-x-0 top-0 z-50 h-1 animate-pulse bg-pine-700">
      <span className="sr-only">{t("common.loading")}</span>
    </div>
  );
}

/** A staff member who opened the homeowner portal: point them to their own app. */
export function StaffOnPortal({ user }: { user: CurrentUser }) {
  const { t } = useTranslation();
  return (
    <Page title={t("staffOnPortal.title")} intro={t("staffOnPortal.intro", { name: user.name, company: user.companyName })}>
      <a href="/staff/" className={buttonClasses("primary")}>
        {t("staffOnPortal.openStaffApp")}
      </a>
    </Page>
  );
}

/** Shown while the first (lazy) screen of a visit downloads. */
export function PortalLoading() {
  const { t } = useTranslation();
  return <LoadingState label={t("common.loading")} />;
}

/** /preferences is the server's name for Settings (its confirmation links point there); keep the query. */
export function SettingsAlias() {
  const { search } = useLocation();
  return <Navigate to={`/settings${search}`} replace />;
}
