import { meQueryOptions } from "#shared/ui/index";
import { myPlansQueryOptions } from "../common/api/get-my-plans.ts";
import { preferencesQueryOptions } from "../common/api/get-preferences.ts";
import { queryClient } from "./query-client.ts";

/**
 * Every page behind sign-in needs "who is signed in", the homeowner's plans and their saved
 * language: ask for all three at once, from the router, instead of one after the other once
 * each screen has rendered (so the language is settled before the screen's content arrives).
 * Signed out, the other two answer 401 and the sign-in check sends the person on as before.
 * Returns at once: the screens show loading, saved copies and errors themselves.
 */
export function signedInLoader() {
  void queryClient.prefetchQuery(meQueryOptions());
  void queryClient.prefetchQuery(myPlansQueryOptions());
  void queryClient.prefetchQuery(preferencesQueryOptions());
  return null;
}
