import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiFetch, isApiRequestError } from "../api-client.ts";
import { meQueryKey } from "./get-me.ts";

async function signOut(): Promise<void> {
  try {
    await apiFetch("/api/auth/sign-out", { method: "POST" });
  } catch (error) {
    // Already signed out (the session expired): the outcome the person wanted.
    if (isApiRequestError(error) && error.status === 401) return;
    throw error;
  }
}

/** Ends every session of this person, on every device, this one included. */
async function signOutEverywhere(): Promise<void> {
  try {
    await apiFetch("/api/auth/sign-out-everywhere", { method: "POST" });
  } catch (error) {
    // This session had already ended: the person is signed out here, so treat it like signing out.
    if (isApiRequestError(error) && error.status === 401) return;
    throw error;
  }
}

function useEndSession(mutationFn: () => Promise<void>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}

/** Signs out, drops every cached answer of this person, and lets the route guard redirect. */
export function useSignOut() {
  return useEndSession(signOut);
}

/** Like useSignOut, for every device at once; unused sign-in links stop working too. */
export function useSignOutEverywhere() {
  return useEndSession(signOutEverywhere);
}
