import { PersistQueryClientProvider } from "@tanstack/react-query-persist-client";
import { useEffect, useState } from "react";
import { RouterProvider } from "react-router-dom";
import { createQueryClient } from "#shared/ui/index";
import { dropSavedCopyOnSignOut, keepQueriesForOffline, persistOptions } from "../common/api/offline-cache.ts";
import { router } from "./router.tsx";

function createPortalQueryClient() {
  const queryClient = createQueryClient();
  keepQueriesForOffline(queryClient);
  return queryClient;
}

export function Providers() {
  const [queryClient] = useState(createPortalQueryClient);
  useEffect(() => dropSavedCopyOnSignOut(queryClient), [queryClient]);
  return (
    <PersistQueryClientProvider
      client={queryClient}
      persistOptions={persistOptions}
      // A saved copy may predate the last change (a reload right after ticking a step):
      // show it at once, but always ask the server again.
      onSuccess={() => void queryClient.invalidateQueries()}
    >
      <RouterProvider router={router} />
    </PersistQueryClientProvider>
  );
}
