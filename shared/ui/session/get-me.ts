import { queryOptions, useQuery } from "@tanstack/react-query";
import { meResponseSchema, type CurrentUser } from "#shared/schemas/auth";
import { apiFetch, isApiRequestError } from "../api-client.ts";

export const meQueryKey = ["session", "me"] as const;

/** The signed-in person, or null when nobody is signed in (a 401 is an answer, not a failure). */
export async function getMe(signal?: AbortSignal): Promise<CurrentUser | null> {
  try {
    const { user } = await apiFetch("/api/me", { schema: meResponseSchema, signal });
    return user;
  } catch (error) {
    if (isApiRequestError(error) && error.status === 401) return null;
    throw error;
  }
}

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}

/** For screens behind <RequireSignIn>, which only renders them once "me" is known. */
export function useSignedInUser(): CurrentUser {
  const { data } = useMe();
  if (!data) throw new Error("useSignedInUser() used outside <RequireSignIn>");
  return data;
}

export function firstName(user: Pick<CurrentUser, "name">): string {
  return user.name.trim().split(/\s+/)[0] || user.name;
}
