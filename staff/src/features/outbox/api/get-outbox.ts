import { queryOptions, useQuery } from "@tanstack/react-query";
import { outboxResponseSchema, type OutboxMessage } from "#shared/schemas/outbox";
import { apiFetch, isApiRequestError } from "#shared/ui/index";

export const outboxRefetchMs = 3_000;

/** Every SMS and e-mail the local fakes received, newest first. 404 in production. */
export async function getOutbox(signal?: AbortSignal): Promise<OutboxMessage[]> {
  const { messages } = await apiFetch("/api/dev/outbox", { schema: outboxResponseSchema, signal });
  return [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}

export function outboxQueryOptions() {
  return queryOptions({
    queryKey: ["dev", "outbox"] as const,
    queryFn: ({ signal }) => getOutbox(signal),
  });
}

/** The outbox, re-checked every few seconds while the page is visible. */
export function useOutbox() {
  return useQuery({
    ...outboxQueryOptions(),
    staleTime: 0,
    // No point asking again every few seconds when the server says there is no outbox.
    refetchInterval: (query) => (isApiRequestError(query.state.error) && query.state.error.status === 404 ? false : outboxRefetchMs),
  });
}

/**
 * Whether to offer the outbox in the navigation: always in a Vite dev build, otherwise
 * only when the server answers (it returns 404 in production).
 */
export function useOutboxAvailable(signedInAsStaff: boolean): boolean {
  const probe = useQuery({ ...outboxQueryOptions(), enabled: signedInAsStaff && !import.meta.env.DEV });
  return import.meta.env.DEV || probe.data !== undefined;
}
