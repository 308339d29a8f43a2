import { createBrowserRouter } from "react-router-dom";
import { NotFoundPage, RequireSignIn, RouteErrorPage } from "#shared/ui/index";
import { TodayRoute } from "../features/today/today-route.tsx";
import { VerifyRoute } from "../features/sign-in/verify-route.tsx";
import { PortalLoading, PublicLayout, SettingsAlias, SignedInLayout, StaffOnPortal } from "./layouts.tsx";
import { productLabel } from "./product.ts";

// Paths are relative to /portal: the server serves this app there.
// Today is in the first download; every other screen (image processing, print styles,
// forms and their validation library) loads when first opened, keeping the first load small on a phone.
export const router = createBrowserRouter(
  [
    {
      errorElement: <RouteErrorPage productLabel={productLabel} />,
      hydrateFallbackElement: <PortalLoading />,
      children: [
        {
          element: <PublicLayout />,
          children: [
            { path: "sign-in", lazy: () => import("../features/sign-in/sign-in-route.tsx").then((m) => ({ Component: m.SignInRoute })) },
            { path: "sign-in/verify", element: <VerifyRoute /> },
          ],
        },
        {
          element: <SignedInLayout />,
          children: [
            {
              element: <RequireSignIn signInPath="/sign-in" allowedRoles={["customer"]} wrongRole={(user) => <StaffOnPortal user={user} />} />,
              children: [
                { index: true, element: <TodayRoute /> },
                { path: "plan", lazy: () => import("../features/plan/plan-route.tsx").then((m) => ({ Component: m.PlanRoute })) },
                { path: "plan/:planId", lazy: () => import("../features/plan/plan-route.tsx").then((m) => ({ Component: m.PlanRoute })) },
                { path: "ask", lazy: () => import("../features/ask/ask-route.tsx").then((m) => ({ Component: m.AskRoute })) },
                { path: "messages", lazy: () => import("../features/messages/messages-route.tsx").then((m) => ({ Component: m.MessagesRoute })) },
                // The contact-change confirmation link lands here (server/features/preferences).
                { path: "preferences", element: <SettingsAlias /> },
                { path: "settings", lazy: () => import("../features/settings/settings-route.tsx").then((m) => ({ Component: m.SettingsRoute })) },
              ],
            },
          ],
        },
        { element: <PublicLayout />, children: [{ path: "*", element: <NotFoundPage /> }] },
      ],
    },
  ],
  { basename: "/portal" },
);
