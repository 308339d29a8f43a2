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

/** Signs out, drops every cached answer of this person, and lets the route guard redirect. */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
