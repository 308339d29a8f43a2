import { createBrowserRouter } from "react-router-dom";
import { NotFoundPage, RequireSignIn, RouteErrorPage } from "#shared/ui/index";
import { VerifyRoute } from "../features/sign-in/verify-route.tsx";
import { todayLoader } from "../features/today/today-loader.ts";
import { PortalLoading, PublicLayout, SettingsAlias, SignedInLayout, StaffOnPortal } from "./layouts.tsx";
import { signedInLoader } from "./loaders.ts";
import { productLabel } from "./product.ts";
import { queryClient } from "./query-client.ts";

// Paths are relative to /portal: the server serves this app there.
// Every screen is its own route module, loaded when first opened (image processing, print styles,
// forms and their validation library stay out of the first load on a phone). The loaders are in
// the first download: they start the screen's requests while its code is still on its way.
// The sign-in link's landing page stays in the first download: it has no request to overlap with.
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
          loader: signedInLoader,
          children: [
            {
              element: <RequireSignIn signInPath="/sign-in" keepTarget allowedRoles={["customer"]} wrongRole={(user) => <StaffOnPortal user={user} />} />,
              children: [
                { index: true, loader: todayLoader(queryClient), lazy: () => import("../features/today/today-route.tsx").then((m) => ({ Component: m.TodayRoute })) },
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
