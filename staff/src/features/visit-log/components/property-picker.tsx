import { useState } from "react";
import { Button, FieldError, TextField, useDebouncedValue } from "#shared/ui/index";
import { useCustomerSearch } from "../../../common/api/search-customers.ts";
import type { ChosenLawn } from "../lib/chosen-lawn.ts";
import { fieldId } from "../lib/form-values.ts";

export interface PropertyPickerProps {
  chosen: ChosenLawn | null;
  onChoose: (lawn: ChosenLawn | null) => void;
  error?: string;
}

/** Finds the customer by name, street or phone and picks the lawn the visit was on. */
export function PropertyPicker({ chosen, onChoose, error }: PropertyPickerProps) {
  const [search, setSearch] = useState("");
  const q = useDebouncedValue(search.trim(), 250);
  const results = useCustomerSearch(q);

  if (chosen) {
    return (
      <div className="flex flex-wrap items-center justify-between gap-3 rounded-lg border-2 border-pine-700 bg-pine-50 p-3" data-testid="chosen-lawn">
        <p>
          <strong>{chosen.customerName}</strong>
          <br />
          {chosen.street}, {chosen.town} ({chosen.label})
        </p>
        <Button variant="secondary" onClick={() => onChoose(null)}>
          Change lawn
        </Button>
      </div>
    );
  }

  const lawns = (results.data ?? []).flatMap((customer) =>
    customer.properties.map((property) => ({
      customerId: customer.id,
      customerName: `${customer.firstName} ${customer.lastName}`,
      propertyId: property.id,
      label: property.label,
      street: property.street,
      town: property.town,
    })),
  );

  return (
    <div className="flex flex-col gap-2">
      <TextField
        id={fieldId("propertyId")}
        label="Customer"
        hint="Search by name, street or phone number."
        type="search"
        autoComplete="off"
        value={search}
        onChange={(event) => setSearch(event.target.value)}
        error={error}
      />
      <p role="status" className="text-base text-ink-soft">
        {!q ? "" : results.isFetching && !results.data ? "Searching…" : results.isError ? "" : lawns.length === 0 ? `No lawn matches “${q}”.` : `${lawns.length} ${lawns.length === 1 ? "lawn" : "lawns"} found`}
      </p>
      {results.isError && <FieldError message="The search didn't work. Check your connection and try again." />}
      {q && lawns.length > 0 && (
        <ul className="flex flex-col gap-2" aria-label="Lawns found">
          {lawns.map((lawn) => (
            <li key={lawn.propertyId}>
              <button
                type="button"
                onClick={() => onChoose(lawn)}
                className="flex min-h-11 w-full flex-col items-start rounded-lg border-2 border-line-strong bg-surface px-3 py-2 text-left hover:border-pine-700 hover:bg-pine-50"
              >
                <span className="font-semibold">{lawn.customerName}</span>
                <span className="text-ink-soft">
                  {lawn.street}, {lawn.town} ({lawn.label})
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
