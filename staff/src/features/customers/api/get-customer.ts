import { queryOptions, useQuery } from "@tanstack/react-query";
import { customerDetailSchema, type CustomerDetail } from "#shared/schemas/customers";
import { apiFetch } from "#shared/ui/index";

/** The customer page: lawns, care plans with progress, conversations, visits, follow-up visits and reminders. */
export async function getCustomer(id: number, signal?: AbortSignal): Promise<CustomerDetail> {
  return apiFetch(`/api/customers/${id}`, { schema: customerDetailSchema, signal });
}

export function customerQueryOptions(id: number) {
  return queryOptions({ queryKey: ["customers", id] as const, queryFn: ({ signal }) => getCustomer(id, signal) });
}

export function useCustomer(id: number) {
  return useQuery(customerQueryOptions(id));
}
