import { PersistQueryClientProvider } from "@tanstack/react-query-persist-client";
import { RouterProvider } from "react-router-dom";
import { persistOptions } from "../common/api/offline-cache.ts";
import { queryClient } from "./query-client.ts";
import { router } from "./router.tsx";

export function Providers() {
  return (
    <PersistQueryClientProvider
      client={queryClient}
      persistOptions={persistOptions}
      // A saved copy may predate the last change (a reload right after ticking a step):
      // show it at once, but always ask the server again. Requests the loaders started
      // before the restore already do, so they are kept rather than cancelled and repeated.
      onSuccess={() => void queryClient.invalidateQueries(undefined, { cancelRefetch: false })}
    >
      <RouterProvider router={router} />
    </PersistQueryClientProvider>
  );
}
