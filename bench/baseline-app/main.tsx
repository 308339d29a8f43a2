// The bare stack the portal is measured against: React, React Router and TanStack Query
// doing one trivial thing each, so the comparison shows what our own code adds.
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { createBrowserRouter, RouterProvider } from "react-router-dom";
import { QueryClient, QueryClientProvider, useQuery } from "@tanstack/react-query";

function Home() {
  const { data } = useQuery({ queryKey: ["hello"], queryFn: async () => "hello" });
  return <h1>{data}</h1>;
}

const router = createBrowserRouter([{ path: "/", element: <Home /> }]);
createRoot(document.getElementById("root")!).render(
  <StrictMode>
    <QueryClientProvider client={new QueryClient()}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  </StrictMode>,
);
