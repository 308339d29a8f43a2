import { useState } from "react";
import { ErrorState, LoadingState } from "#shared/ui/index";
import { CrewWarnings } from "../../../common/components/crew-warnings.tsx";
import { usePlan } from "../../../common/api/get-plan.ts";

/** The plan's warnings, loaded only when opened: most visits to a customer's page don't need them. */
export function PlanWarningsPanel({ planId }: { planId: number }) {
  const [open, setOpen] = useState(false);
  return (
    <details onToggle={(e) => setOpen(e.currentTarget.open)} className="rounded-lg border border-line p-3">
      <summary className="min-h-11 cursor-pointer content-center font-semibold">Warnings on this plan</summary>
      {open && <LoadedWarnings planId={planId} />}
    </details>
  );
}

function LoadedWarnings({ planId }: { planId: number }) {
  const plan = usePlan(planId);
  if (plan.isPending) return <LoadingState label="Loading the plan's warnings…" />;
  if (plan.isError) return <ErrorState error={plan.error} onRetry={() => void plan.refetch()} retrying={plan.isFetching} />;
  return (
    <div className="mt-2">
      <CrewWarnings warnings={plan.data.warnings} title="For the crew" emptyText="No warnings on this plan." headingLevel={4} />
    </div>
  );
}
