import { createBrowserRouter } from "react-router-dom";
import { staffRoles } from "#shared/schemas/auth";
import { NotFoundPage, RequireSignIn, RouteErrorPage } from "#shared/ui/index";
import { HomeRoute } from "../features/home/home-route.tsx";
import { OutboxRoute } from "../features/outbox/outbox-route.tsx";
import { PlanPreviewRoute } from "../features/plan-preview/plan-preview-route.tsx";
import { SignInRoute } from "../features/sign-in/sign-in-route.tsx";
import { CustomerOnStaff, PublicLayout, StaffLayout } from "./layouts.tsx";
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
