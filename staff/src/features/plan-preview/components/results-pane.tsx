import type { UseQueryResult } from "@tanstack/react-query";
import type { Plan } from "#shared/engine/index";
import { EmptyState, ErrorState, LoadingState, Spinner, isApiRequestError } from "#shared/ui/index";
import type { CurrentProgram } from "../api/get-current-program.ts";
import { PlanResults } from "./plan-results.tsx";

export interface ResultsPaneProps {
  program: UseQueryResult<CurrentProgram>;
  preview: UseQueryResult<Plan>;
  /** The latest plan worked out, kept while a newer input is refused. */
  plan: Plan | null;
}

/** Loading, error and empty states around the plan itself. */
export function ResultsPane({ program, preview, plan }: ResultsPaneProps) {
  if (program.isError) {
    return (
      <ErrorState
        title="The care program didn't load"
        error={program.error}
        onRetry={() => void program.refetch()}
        retrying={program.isFetching}
      />
    );
  }
  if (program.isPending) return <LoadingState label="Loading the care program…" />;

  // A 400 is shown on the form fields themselves; other failures get a retry here.
  const failedToRun = preview.isError && !(isApiRequestError(preview.error) && preview.error.status === 400);

  return (
    <div className="flex flex-col gap-4">
      {failedToRun && (
        <ErrorState title="The plan couldn't be worked out" error={preview.error} onRetry={() => void preview.refetch()} retrying={preview.isFetching} />
      )}
      {plan ? (
        <PlanResults plan={plan} />
      ) : preview.isFetching ? (
        <LoadingState label="Working out the plan…" />
      ) : (
        !failedToRun && (
          <EmptyState title="No plan yet">Fix the marked fields in the form and the plan appears here.</EmptyState>
        )
      )}
    </div>
  );
}

/** Shown next to the results heading while a newer plan is on its way; the older one stays readable meanwhile. */
export function UpdatingIndicator({ updating }: { updating: boolean }) {
  if (!updating) return null;
  return (
    <span className="inline-flex items-center gap-2 text-base text-ink-soft">
      <Spinner className="size-4 text-pine-700" /> Updating…
    </span>
  );
}
