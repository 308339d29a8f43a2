import type { FollowUpListQuery } from "#shared/schemas/follow-ups";
import { SelectField } from "#shared/ui/index";

type Sort = FollowUpListQuery["sort"];
type Order = FollowUpListQuery["order"];

const choices: { value: `${Sort}:${Order}`; label: string }[] = [
  { value: "date:desc", label: "Newest date first" },
  { value: "date:asc", label: "Oldest date first" },
  { value: "status:asc", label: "Status" },
  { value: "customer:asc", label: "Customer (A–Z)" },
  { value: "technician:asc", label: "Technician (A–Z)" },
  { value: "labourHours:desc", label: "Most labor hours first" },
];

/** Cards have no column headers to press, so phones get the common sort orders as one select. */
export function PhoneSort({ sort, order, onSort }: { sort: Sort; order: Order; onSort: (sort: Sort, order: Order) => void }) {
  const current = `${sort}:${order}`;
  const options = choices.some((c) => c.value === current) ? choices : [...choices, { value: current, label: `${sort} (${order})` }];
  return (
    <SelectField
      label="Sort by"
      options={options}
      value={current}
      onChange={(e) => {
        const [nextSort, nextOrder] = e.target.value.split(":") as [Sort, Order];
        onSort(nextSort, nextOrder);
      }}
    />
  );
}
