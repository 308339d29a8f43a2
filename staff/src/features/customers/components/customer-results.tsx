import { Link } from "react-router-dom";
import type { CustomerSummary } from "#shared/schemas/customers";

/** Search results: enough to tell two customers apart before opening one. */
export function CustomerResults({ customers }: { customers: CustomerSummary[] }) {
  return (
    <ul className="grid gap-3 md:grid-cols-2" aria-label="Customers found">
      {customers.map((customer) => (
        <li key={customer.id} className="flex flex-col gap-1 rounded-xl border border-line bg-surface p-4">
          <Link to={`/customers/${customer.id}`} className="inline-flex min-h-11 items-center text-lg font-semibold">
            {customer.firstName} {customer.lastName}
          </Link>
          {customer.properties.map((property) => (
            <p key={property.id}>
              {property.street}, {property.town}
            </p>
          ))}
          <p className="text-base text-ink-soft [overflow-wrap:anywhere]">
            {[customer.phone, customer.email, customer.externalRef && `No. ${customer.externalRef}`].filter(Boolean).join(" · ")}
          </p>
          <p className="text-base">
            {customer.activePlans === 0 ? "No active care plan" : customer.activePlans === 1 ? "1 active care plan" : `${customer.activePlans} active care plans`}
          </p>
        </li>
      ))}
    </ul>
  );
}
