import { createSyncStoragePersister } from "@tanstack/query-sync-storage-persister";
import type { QueryClient } from "@tanstack/react-query";
import type { PersistQueryClientOptions } from "@tanstack/react-query-persist-client";
import { meQueryKey } from "#shared/ui/index";
import { offlineMaxAgeMs, offlineReadableRoots } from "./query-keys.ts";

/**
 * Keeps the plan, today's steps and the conversation on the device so a homeowner can read
 * them in the garden with no signal. Bump `buster` when a cached shape changes, so old
 * copies are dropped instead of misread.
 */
const buster = "portal-cache-v1";

export const queryPersister = createSyncStoragePersister({
  storage: typeof window === "undefined" ? undefined : window.localStorage,
  key: "sproutline.portal-cache",
  // Ticking steps off quickly shouldn't write localStorage on every tap.
  throttleTime: 1000,
});

/**
 * Structural on purpose: the persist client ships its own nested copy of query-core
 * (5.104 beside our 5.108), whose Query class type differs from ours.
 */
interface CachedQuery {
  queryKey: readonly unknown[];
  state: { status: string; data: unknown };
}

function isOfflineReadable(query: CachedQuery): boolean {
  if (query.state.status !== "success") return false;
  const root = query.queryKey[0];
  if (typeof root !== "string" || !offlineReadableRoots.has(root)) return false;
  // "me" as null means signed out: never keep that (or anything else) around.
  if (root === meQueryKey[0]) return query.state.data !== null;
  return true;
}

export const persistOptions: Omit<PersistQueryClientOptions, "queryClient"> = {
  persister: queryPersister,
  maxAge: offlineMaxAgeMs,
  buster,
  dehydrateOptions: { shouldDehydrateQuery: isOfflineReadable },
};

/** A restored answer is thrown away once unused longer than this, so it must outlive maxAge. */
export function keepQueriesForOffline(queryClient: QueryClient) {
  const defaults = queryClient.getDefaultOptions();
  queryClient.setDefaultOptions({ ...defaults, queries: { ...defaults.queries, gcTime: offlineMaxAgeMs } });
}

/**
 * Forgets this person's data on the device: the saved copy, and the answers still in memory,
 * which the persister would otherwise write straight back on its next (throttled) save.
 */
function forgetSignedInData(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== meQueryKey[0] });
  void queryPersister.removeClient();
}

/** …the moment they sign out, or their session ends (signed out elsewhere, expired). */
export function dropSavedCopyOnSignOut(queryClient: QueryClient): () => void {
  return queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== "updated" || event.query.queryKey[0] !== meQueryKey[0]) return;
    if (event.query.state.status === "success" && event.query.state.data === null) forgetSignedInData(queryClient);
  });
}
