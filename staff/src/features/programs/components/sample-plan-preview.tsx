import type { UseQueryResult } from "@tanstack/react-query";
import { ErrorState, LoadingState, Spinner } from "#shared/ui/index";
import type { SamplePlan } from "../api/preview-sample-plan.ts";
import { formatMilestone, milestonesOf } from "../lib/milestones.ts";
import { sampleDescription } from "../lib/sample-visit.ts";

export interface SamplePlanPreviewProps {
  version: number;
  current: UseQueryResult<SamplePlan>;
  edited: UseQueryResult<SamplePlan>;
  /** The form has errors: the preview shows the last values that were valid. */
  stale: boolean;
}

/** A sample job's key dates under the program in force and under the edited values, side by side. */
export function SamplePlanPreview({ version, current, edited, stale }: SamplePlanPreviewProps) {
  const updating = edited.isFetching && edited.data !== undefined;
  return (
    <section aria-labelledby="program-preview-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="program-preview-heading" className="text-2xl text-pine-900">
          Sample plan
        </h2>
        <span role="status" className="inline-flex min-h-6 items-center gap-2 text-ink-soft">
          {updating && (
            <>
              <Spinner /> Updating…
            </>
          )}
        </span>
      </div>
      <p className="text-ink-soft">{sampleDescription}</p>
      {stale && <p className="font-semibold text-rust-700">Fix the marked settings to update the sample.</p>}
      {(current.isError || edited.isError) && (
        <ErrorState title="The sample plan didn't load" error={current.error ?? edited.error} onRetry={() => void (current.isError ? current : edited).refetch()} />
      )}
      {(current.isPending || edited.isPending) && !current.isError && !edited.isError && <LoadingState label="Working out the sample plan…" />}
      {current.data && edited.data && <MilestoneTable version={version} current={current.data} edited={edited.data} />}
      {edited.data && <SampleWarnings plan={edited.data} />}
    </section>
  );
}

function MilestoneTable({ version, current, edited }: { version: number; current: SamplePlan; edited: SamplePlan }) {
  const before = new Map(milestonesOf(current).map((m) => [m.key, m]));
  const after = milestonesOf(edited);
  const visitDate = edited.meta.visitDate;
  return (
    <div className="relative overflow-x-auto rounded-xl border border-line bg-surface">
      <table className="w-full border-collapse text-left text-base">
        <caption className="sr-only">Key dates of the sample plan under version {version} and with your changes</caption>
        <thead className="border-b-2 border-line bg-canvas">
          <tr>
            <th scope="col" className="px-3 py-2">
              Milestone
            </th>
            <th scope="col" className="px-3 py-2">
              Version {version}
            </th>
            <th scope="col" className="px-3 py-2">
              With your changes
            </th>
          </tr>
        </thead>
        <tbody>
          {after.map((m) => {
            const was = before.get(m.key)?.value ?? null;
            const changed = was !== m.value;
            return (
              <tr key={m.key} className={`border-b border-line last:border-0 ${changed ? "bg-pine-50" : ""}`}>
                <th scope="row" className="px-3 py-2 font-semibold">
                  {m.label}
                </th>
                <td className="px-3 py-2">{formatMilestone(was, visitDate)}</td>
                <td className={`px-3 py-2 ${changed ? "font-bold text-pine-900" : ""}`}>
                  {formatMilestone(m.value, visitDate)}
                  {changed && <span className="sr-only"> (changed)</span>}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

const severityTone = { risk: "border-rust-700 bg-rust-50 text-rust-700", caution: "border-straw-800 bg-straw-50 text-straw-800", info: "border-line bg-surface" } as const;

function SampleWarnings({ plan }: { plan: SamplePlan }) {
  // The crew's wording: homeowner versions of the same findings would only repeat them here.
  const warnings = plan.warnings.filter((w) => w.audience === "crew");
  if (warnings.length === 0) return <p className="text-ink-soft">No warnings for the sample job.</p>;
  return (
    <div>
      <h3 className="mb-2 text-lg">Warnings on the sample plan</h3>
      <ul className="flex flex-col gap-2">
        {warnings.map((w) => (
          <li key={w.code} className={`rounded-lg border-l-4 p-3 ${severityTone[w.severity]}`}>
            {w.message}
          </li>
        ))}
      </ul>
    </div>
  );
}
