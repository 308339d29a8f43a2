import { meQueryOptions } from "#shared/ui/index";
import { queryClient } from "./query-client.ts";

/**
 * Every staff page behind sign-in needs "who is signed in": ask from the router, at the same
 * time as the screen's own loader starts its requests, instead of the screen waiting for the
 * sign-in check to render first. Returns at once: the sign-in check shows loading, redirects
 * and errors itself.
 */
export function signedInLoader() {
  void queryClient.prefetchQuery(meQueryOptions());
  return null;
}
