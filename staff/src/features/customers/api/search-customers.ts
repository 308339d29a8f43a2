import { keepPreviousData, queryOptions, useQuery } from "@tanstack/react-query";
import { customerSearchResponseSchema, type CustomerSummary } from "#shared/schemas/customers";
import { apiFetch } from "#shared/ui/index";

export const CUSTOMER_PAGE_SIZE = 25;

/** By name, street, phone (any format), e-mail or customer number; an empty search lists A–Z. */
export async function searchCustomers(q: string, signal?: AbortSignal): Promise<CustomerSummary[]> {
  const params = new URLSearchParams({ q, limit: String(CUSTOMER_PAGE_SIZE) });
  const { customers } = await apiFetch(`/api/customers?${params}`, { schema: customerSearchResponseSchema, signal });
  return customers;
}

export function customerSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: ["customers", "search", q, CUSTOMER_PAGE_SIZE] as const,
    queryFn: ({ signal }) => searchCustomers(q, signal),
    // The last results stay while the next search runs, so the list doesn't flash empty per keystroke.
    placeholderData: keepPreviousData,
  });
}

export function useCustomerSearch(q: string) {
  return useQuery(customerSearchQueryOptions(q.trim()));
}
