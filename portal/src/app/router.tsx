import { createBrowserRouter } from "react-router-dom";
import { NotFoundPage, RequireSignIn, RouteErrorPage } from "#shared/ui/index";
import { HomeRoute } from "../features/home/home-route.tsx";
import { SignInRoute } from "../features/sign-in/sign-in-route.tsx";
import { VerifyRoute } from "../features/sign-in/verify-route.tsx";
import { PublicLayout, SignedInLayout, StaffOnPortal } from "./layouts.tsx";
import { productLabel } from "./product.ts";

// Paths are relative to /portal: the server serves this app there.
export const router = createBrowserRouter(
  [
    {
      errorElement: <RouteErrorPage productLabel={productLabel} />,
      children: [
        {
          element: <PublicLayout />,
          children: [
            { path: "sign-in", element: <SignInRoute /> },
            { path: "sign-in/verify", element: <VerifyRoute /> },
          ],
        },
        {
          element: <SignedInLayout />,
          children: [
            {
              element: <RequireSignIn signInPath="/sign-in" allowedRoles={["customer"]} wrongRole={(user) => <StaffOnPortal user={user} />} />,
              children: [{ index: true, element: <HomeRoute /> }],
            },
          ],
        },
        { element: <PublicLayout />, children: [{ path: "*", element: <NotFoundPage /> }] },
      ],
    },
  ],
  { basename: "/portal" },
);
