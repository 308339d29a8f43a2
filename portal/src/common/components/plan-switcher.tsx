import { useId } from "react";
import { useTranslation } from "react-i18next";
import type { PlanHeader } from "#shared/schemas/plans";
import { formatShortDate } from "../lib/dates.ts";

export interface PlanSwitcherProps {
  plans: readonly PlanHeader[];
  selectedId: number;
  onChange: (planId: number) => void;
}

/** Only for homeowners with several lawns or plans; one plan needs no choice. */
export function PlanSwitcher({ plans, selectedId, onChange }: PlanSwitcherProps) {
  const { t, i18n } = useTranslation();
  const id = useId();
  if (plans.length < 2) return null;
  return (
    <div className="mb-5 flex flex-col gap-1 print:hidden">
      <label htmlFor={id} className="font-semibold">
        {t("planSwitcher.label")}
      </label>
      <select
        id={id}
        value={selectedId}
        onChange={(event) => onChange(Number(event.target.value))}
        className="min-h-12 w-full rounded-lg border-2 border-line-strong bg-surface px-3 text-lg"
      >
        {plans.map((plan) => (
          <option key={plan.id} value={plan.id}>
            {t("planSwitcher.option", {
              label: plan.propertyLabel,
              street: plan.street,
              date: formatShortDate(plan.visitDate, i18n.language),
            })}
            {plan.status === "cancelled" ? ` ${t("planSwitcher.cancelled")}` : ""}
          </option>
        ))}
      </select>
    </div>
  );
}
