import { useMemo } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { CrewWarnings } from "../../../common/components/crew-warnings.tsx";
import { useProperty } from "../api/get-property.ts";
import type { VisitFormValues } from "../lib/form-values.ts";
import { warningsForVisit } from "../lib/visit-warnings.ts";

const box = "flex min-w-0 flex-col gap-3 rounded-xl border border-line bg-surface p-4 sm:p-5";

/** The engine's warnings for the figures as typed, so the technician can still change them before saving. */
export function VisitWarnings({ propertyId }: { propertyId: number | null }) {
  const { control } = useFormContext<VisitFormValues>();
  const [visit, lawnToday] = useWatch({ control, name: ["visit", "lawn"] });
  const property = useProperty(propertyId);
  const visitJson = JSON.stringify({ visit, lawn: lawnToday });
  // Recomputed only when a figure or the lawn changes, not on every render of the form.
  const result = useMemo(
    () => warningsForVisit(JSON.parse(visitJson) as VisitFormValues, property.data),
    [visitJson, property.data],
  );

  if (propertyId === null) return <p className={`${box} text-ink-soft`}>Pick the customer's lawn to check these figures against it.</p>;
  if (property.isPending) return <p className={`${box} text-ink-soft`} role="status">Loading the lawn's details…</p>;
  if (property.isError) {
    return <p className={`${box} text-ink-soft`}>The lawn's details didn't load, so these figures aren't checked here. Saving still works.</p>;
  }
  return (
    <div className={box} data-testid="visit-warnings">
      {result.state === "ready" ? (
        <CrewWarnings warnings={result.warnings} title="Check before saving" emptyText="Nothing unusual in these figures." headingLevel={2} live />
      ) : (
        <>
          <h2 className="text-xl text-pine-900">Check before saving</h2>
          <p className="text-ink-soft" aria-live="polite">
            Warnings show here once the services, the area and every seed and product line are filled in.
          </p>
        </>
      )}
    </div>
  );
}
