import { useState } from "react";
import { useSearchParams } from "react-router-dom";
import { EmptyState, ErrorState, LoadingState, Page, TextField, useDebouncedValue } from "#shared/ui/index";
import { CUSTOMER_PAGE_SIZE, useCustomerSearch } from "./api/search-customers.ts";
import { CustomerResults } from "./components/customer-results.tsx";

/** Find a customer by name, address or phone. The search lives in the address, so Back returns to it. */
export function CustomersRoute() {
  const [params, setParams] = useSearchParams();
  const [typed, setTyped] = useState(params.get("q") ?? "");
  const q = useDebouncedValue(typed.trim(), 250);
  const results = useCustomerSearch(q);

  const onType = (value: string) => {
    setTyped(value);
    setParams(value.trim() ? { q: value.trim() } : {}, { replace: true });
  };

  const count = results.data?.length ?? 0;
  return (
    <Page title="Customers" width="wide" intro="Search by name, street, phone number, e-mail or customer number.">
      <form role="search" onSubmit={(event) => event.preventDefault()} className="mb-4 max-w-xl">
        <TextField label="Search customers" type="search" autoComplete="off" value={typed} onChange={(event) => onType(event.target.value)} />
      </form>
      <p role="status" className="mb-3 text-ink-soft">
        {results.data &&
          (q
            ? `${count} ${count === 1 ? "customer matches" : "customers match"} “${q}”${count === CUSTOMER_PAGE_SIZE ? " (the first 25; add more to the search)" : ""}`
            : `The first ${count} customers, A–Z. Search to find anyone else.`)}
      </p>
      {results.isPending && <LoadingState label="Searching…" />}
      {results.isError && <ErrorState title="The search didn't work" error={results.error} onRetry={() => void results.refetch()} retrying={results.isRefetching} />}
      {results.data &&
        (count === 0 ? (
          <EmptyState title="No customer matches">
            <p>Check the spelling, or search by street or phone number instead.</p>
          </EmptyState>
        ) : (
          <CustomerResults customers={results.data} />
        ))}
    </Page>
  );
}
