import { MutationCache, QueryCache, QueryClient } from "@tanstack/react-query";
import { isApiRequestError } from "./api-client.ts";
import { meQueryKey } from "./session/get-me.ts";

/**
 * One QueryClient per app. A 4xx answer will not change on retry, so only network
 * and server errors are retried. A 401 from any endpoint means the session ended:
 * marking "me" as signed out lets the route guard send the person to sign in.
 */
export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError: (error, query) => onUnauthenticated(error, query.queryKey) }),
    mutationCache: new MutationCache({ onError: (error) => onUnauthenticated(error) }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failureCount, error) => failureCount < 2 && !isClientError(error),
      },
      mutations: { retry: false },
    },
  });

  function onUnauthenticated(error: unknown, queryKey?: readonly unknown[]) {
    if (!isApiRequestError(error) || error.status !== 401) return;
    if (queryKey && queryKey[0] === meQueryKey[0]) return;
    if (queryClient.getQueryData(meQueryKey)) queryClient.setQueryData(meQueryKey, null);
  }

  return queryClient;
}

function isClientError(error: unknown): boolean {
  return isApiRequestError(error) && error.status >= 400 && error.status < 500;
}
