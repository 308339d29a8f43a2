import { createQueryClient } from "#shared/ui/index";

/**
 * The staff app's one QueryClient. It exists from the start (not inside React) so the route
 * loaders can start the first requests while the screen's code is still downloading.
 */
export const queryClient = createQueryClient();
