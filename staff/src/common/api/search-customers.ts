import { keepPreviousData, queryOptions, skipToken, useQuery } from "@tanstack/react-query";
import { customerSearchResponseSchema, type CustomerSummary } from "#shared/schemas/customers";
import { apiFetch } from "#shared/ui/index";

/** For pickers (visit form, new follow-up): customers whose name, street, phone, e-mail or number matches, with their lawns. */
export async function searchCustomers(q: string, signal?: AbortSignal): Promise<CustomerSummary[]> {
  const params = new URLSearchParams({ q, limit: "10" });
  const { customers } = await apiFetch(`/api/customers?${params}`, { schema: customerSearchResponseSchema, signal });
  return customers;
}

export function customerSearchQueryOptions(q: string) {
  return queryOptions({
    queryKey: ["customers", "search", q, 10] as const,
    queryFn: q ? ({ signal }) => searchCustomers(q, signal) : skipToken,
    placeholderData: keepPreviousData,
  });
}

/** Nothing is asked until something is typed (an empty search lists everyone). */
export function useCustomerSearch(q: string) {
  return useQuery(customerSearchQueryOptions(q.trim()));
}
