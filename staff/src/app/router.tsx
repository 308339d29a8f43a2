import { createBrowserRouter } from "react-router-dom";
import { staffRoles } from "#shared/schemas/auth";
import { LoadingState, NotFoundPage, RequireSignIn, RouteErrorPage } from "#shared/ui/index";
import { questionDetailLoader } from "../features/question-detail/question-detail-loader.ts";
import { questionQueueLoader } from "../features/question-queue/question-queue-loader.ts";
import { CustomerOnStaff, ManagersOnly, PublicLayout, StaffLayout, StaffLoading } from "./layouts.tsx";
import { signedInLoader } from "./loaders.ts";
import { productLabel } from "./product.ts";
import { queryClient } from "./query-client.ts";

// Paths are relative to /staff: the server serves this app there.
// Every screen is its own route module, loaded when first opened: tables, CSV parsing, charts,
// forms and their validation stay out of the first load on a technician's phone. The loaders
// are in the first download: they start the sign-in check and the screen's requests together,
// while its code is still on its way. While the first screen downloads, the header is already
// drawn and the page says it is loading.
export const router = createBrowserRouter(
  [
    {
      errorElement: <RouteErrorPage productLabel={productLabel} />,
      hydrateFallbackElement: <StaffLoading />,
      children: [
        {
          element: <PublicLayout />,
          children: [
            {
              path: "sign-in",
              lazy: () => import("../features/sign-in/sign-in-route.tsx").then((m) => ({ Component: m.SignInRoute })),
              hydrateFallbackElement: <StaffLoading />,
            },
          ],
        },
        {
          element: <StaffLayout />,
          children: [
            {
              element: <RequireSignIn signInPath="/sign-in" allowedRoles={staffRoles} wrongRole={(user) => <CustomerOnStaff user={user} />} />,
              loader: signedInLoader,
              hydrateFallbackElement: <StaffLoading />,
              children: [
                { index: true, lazy: () => import("../features/home/home-route.tsx").then((m) => ({ Component: m.HomeRoute })) },
                { path: "outbox", lazy: () => import("../features/outbox/outbox-route.tsx").then((m) => ({ Component: m.OutboxRoute })) },
                { path: "plan-preview", lazy: () => import("../features/plan-preview/plan-preview-route.tsx").then((m) => ({ Component: m.PlanPreviewRoute })) },
                {
                  path: "sources",
                  lazy: () => import("../features/sources-to-check/sources-to-check-route.tsx").then((m) => ({ Component: m.SourcesToCheckRoute })),
                },
                // Technician screens (managers use them too).
                {
                  path: "questions",
                  loader: questionQueueLoader(queryClient),
                  lazy: () => import("../features/question-queue/question-queue-route.tsx").then((m) => ({ Component: m.QuestionQueueRoute })),
                },
                {
                  path: "questions/:planId",
                  loader: questionDetailLoader(queryClient),
                  lazy: () => import("../features/question-detail/question-detail-route.tsx").then((m) => ({ Component: m.QuestionDetailRoute })),
                },
                { path: "visits/new", lazy: () => import("../features/visit-log/visit-log-route.tsx").then((m) => ({ Component: m.VisitLogRoute })) },
                { path: "customers", lazy: () => import("../features/customers/customers-route.tsx").then((m) => ({ Component: m.CustomersRoute })) },
                { path: "places", lazy: () => import("../features/places/places-route.tsx").then((m) => ({ Component: m.PlacesRoute })) },
                { path: "customers/:customerId", lazy: () => import("../features/customers/customer-route.tsx").then((m) => ({ Component: m.CustomerRoute })) },
                {
                  path: "plans/:planId/as-homeowner",
                  lazy: () => import("../features/homeowner-view/homeowner-view-route.tsx").then((m) => ({ Component: m.HomeownerViewRoute })),
                },
                {
                  // Manager screens: hidden from technicians in the nav, and a plain "Managers only" page if opened directly.
                  element: <ManagersOnly />,
                  children: [
                    { path: "follow-ups", lazy: () => import("../features/follow-ups/follow-ups-route.tsx").then((m) => ({ Component: m.FollowUpsRoute })) },
                    {
                      path: "reports/callbacks",
                      // The charts library is most of its weight and only managers open it.
                      lazy: () => import("../features/callback-report/callback-report-route.tsx").then((m) => ({ Component: m.CallbackReportRoute })),
                      hydrateFallbackElement: <LoadingState label="Loading the callback report…" />,
                    },
                    { path: "programs", lazy: () => import("../features/programs/programs-route.tsx").then((m) => ({ Component: m.ProgramsRoute })) },
                    { path: "team", lazy: () => import("../features/team/team-route.tsx").then((m) => ({ Component: m.TeamRoute })) },
                    {
                      path: "company",
                      lazy: () => import("../features/company-profile/company-profile-route.tsx").then((m) => ({ Component: m.CompanyProfileRoute })),
                    },
                    { path: "import", lazy: () => import("../features/visit-import/visit-import-route.tsx").then((m) => ({ Component: m.VisitImportRoute })) },
                    { path: "unmatched", lazy: () => import("../features/unmatched-inbound/unmatched-inbound-route.tsx").then((m) => ({ Component: m.UnmatchedInboundRoute })) },
                    { path: "audit", lazy: () => import("../features/audit-log/audit-log-route.tsx").then((m) => ({ Component: m.AuditLogRoute })) },
                  ],
                },
                { path: "*", element: <NotFoundPage /> },
              ],
            },
          ],
        },
      ],
    },
  ],
  { basename: "/staff" },
);
