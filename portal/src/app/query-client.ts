import { createQueryClient } from "#shared/ui/index";
import { dropSavedCopyOnSignOut, keepQueriesForOffline } from "../common/api/offline-cache.ts";

/**
 * The portal's one QueryClient. It exists from the start (not inside React) so the route
 * loaders can start the first requests while the page is still starting up.
 */
export const queryClient = createQueryClient();
keepQueriesForOffline(queryClient);
// Subscribed before any request is sent, so even the very first "signed out" answer wipes the saved copy.
dropSavedCopyOnSignOut(queryClient);
