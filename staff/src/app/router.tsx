import { createBrowserRouter } from "react-router-dom";
import { staffRoles } from "#shared/schemas/auth";
import { LoadingState, NotFoundPage, RequireSignIn, RouteErrorPage } from "#shared/ui/index";
import { HomeRoute } from "../features/home/home-route.tsx";
import { OutboxRoute } from "../features/outbox/outbox-route.tsx";
import { PlanPreviewRoute } from "../features/plan-preview/plan-preview-route.tsx";
import { SignInRoute } from "../features/sign-in/sign-in-route.tsx";
import { AuditLogRoute } from "../features/audit-log/audit-log-route.tsx";
import { FollowUpsRoute } from "../features/follow-ups/follow-ups-route.tsx";
import { ProgramsRoute } from "../features/programs/programs-route.tsx";
import { TeamRoute } from "../features/team/team-route.tsx";
import { VisitImportRoute } from "../features/visit-import/visit-import-route.tsx";
import { QuestionQueueRoute } from "../features/question-queue/question-queue-route.tsx";
import { QuestionDetailRoute } from "../features/question-detail/question-detail-route.tsx";
import { VisitLogRoute } from "../features/visit-log/visit-log-route.tsx";
import { CustomersRoute } from "../features/customers/customers-route.tsx";
import { CustomerRoute } from "../features/customers/customer-route.tsx";
import { CustomerOnStaff, ManagersOnly, PublicLayout, StaffLayout } from "./layouts.tsx";
import { productLabel } from "./product.ts";

// Paths are relative to /staff: the server serves this app there.
export const router = createBrowserRouter(
  [
    {
      errorElement: <RouteErrorPage productLabel={productLabel} />,
      children: [
        { element: <PublicLayout />, children: [{ path: "sign-in", element: <SignInRoute /> }] },
        {
          element: <StaffLayout />,
          children: [
            {
              element: <RequireSignIn signInPath="/sign-in" allowedRoles={staffRoles} wrongRole={(user) => <CustomerOnStaff user={user} />} />,
              children: [
                { index: true, element: <HomeRoute /> },
                { path: "outbox", element: <OutboxRoute /> },
                { path: "plan-preview", element: <PlanPreviewRoute /> },
                // Technician screens (managers use them too).
                { path: "questions", element: <QuestionQueueRoute /> },
                { path: "questions/:planId", element: <QuestionDetailRoute /> },
                { path: "visits/new", element: <VisitLogRoute /> },
                { path: "customers", element: <CustomersRoute /> },
                { path: "customers/:customerId", element: <CustomerRoute /> },
                {
                  // Manager screens: hidden from technicians in the nav, and a plain "Managers only" page if opened directly.
                  element: <ManagersOnly />,
                  children: [
                    { path: "follow-ups", element: <FollowUpsRoute /> },
                    {
                      path: "reports/callbacks",
                      // Loaded on demand: the charts library is most of its weight and only managers open it.
                      lazy: async () => ({ Component: (await import("../features/callback-report/callback-report-route.tsx")).CallbackReportRoute }),
                      hydrateFallbackElement: <LoadingState label="Loading the callback report…" />,
                    },
                    { path: "programs", element: <ProgramsRoute /> },
                    { path: "team", element: <TeamRoute /> },
                    { path: "import", element: <VisitImportRoute /> },
                    { path: "audit", element: <AuditLogRoute /> },
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
