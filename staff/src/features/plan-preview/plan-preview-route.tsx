import { useMemo } from "react";
import { FormProvider, useForm } from "react-hook-form";
import type { PlanInputRaw } from "#shared/engine/index";
import { Notice, Page, useDebouncedValue } from "#shared/ui/index";
import { useCurrentProgram } from "./api/get-current-program.ts";
import { usePreviewPlan } from "./api/preview-plan.ts";
import { ErrorSummary } from "./components/error-summary.tsx";
import { PreviewForm } from "./components/preview-form.tsx";
import { ResultsPane, UpdatingIndicator } from "./components/results-pane.tsx";
import { defaultPreviewValues } from "./lib/default-values.ts";
import { FieldErrorsContext, groupErrorPaths, leafPaths, placeServerErrors } from "./lib/field-errors.ts";
import type { PreviewFormValues } from "./lib/form-values.ts";
import { checkPreviewForm } from "./lib/to-plan-input.ts";
import { useLastNonNull } from "./lib/use-last-non-null.ts";

/** Long enough to skip the keystrokes in "6000", short enough to feel live. */
const PREVIEW_DELAY_MS = 300;

/**
 * Staff try out a visit on a made-up property and watch the care plan follow:
 * warnings, the calculators' figures, hold-off windows and the day-by-day steps.
 * Nothing is saved.
 */
export function PlanPreviewRoute() {
  const form = useForm<PreviewFormValues>({ defaultValues: defaultPreviewValues() });
  const values = form.watch();

  // Checked on every change with the engine's own schema, so errors show at once and in place.
  const check = checkPreviewForm(values);
  const validInputJson = useDebouncedValue(check.ok ? JSON.stringify(check.input) : null, PREVIEW_DELAY_MS);
  // While the form has errors the last good input stays, so the plan on screen stays too.
  const lastGoodJson = useLastNonNull(validInputJson);
  const input = useMemo(() => (lastGoodJson ? (JSON.parse(lastGoodJson) as PlanInputRaw) : null), [lastGoodJson]);

  const program = useCurrentProgram();
  const preview = usePreviewPlan(input, program.data);

  const knownPaths = [...leafPaths(values), ...groupErrorPaths(values.visit.seedMix.length, values.visit.products.length)];
  const server = placeServerErrors(preview.error, knownPaths);
  const clientErrors = check.ok ? {} : check.fields;
  const errors = { ...server.fields, ...clientErrors };
  // After a refused input the last good plan stays on screen, next to the marked fields.
  const shownPlan = useLastNonNull(preview.data ?? null);

  return (
    <Page
      title="Plan preview"
      width="wide"
      intro="Change a visit or a property and the care plan below follows. Try things out here: nothing is saved or sent to a homeowner."
    >
      <FieldErrorsContext value={errors}>
        <a href="#plan-preview-results" className="mb-4 inline-flex min-h-11 items-center font-semibold lg:hidden">
          Jump to results
        </a>
        <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.15fr)] lg:items-start">
          <section aria-labelledby="plan-preview-form-heading" className="flex min-w-0 flex-col gap-4">
            <h2 id="plan-preview-form-heading" className="text-2xl text-pine-900">
              Visit and property
            </h2>
            <FormProvider {...form}>
              <PreviewForm />
            </FormProvider>
          </section>

          <section
            id="plan-preview-results"
            aria-labelledby="plan-preview-results-heading"
            // Focusable so keyboard users can scroll the pane, and so "Jump to results" lands here.
            tabIndex={0}
            className="flex min-w-0 flex-col gap-4 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)] lg:overflow-y-auto lg:pr-2"
          >
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="plan-preview-results-heading" className="text-2xl text-pine-900">
                Care plan preview
              </h2>
              <UpdatingIndicator updating={preview.isFetching && preview.data !== undefined} />
            </div>
            {Object.keys(errors).length > 0 && <ErrorSummary fields={errors} />}
            {server.message && (
              <Notice tone="danger" title="The server didn't accept these inputs">
                {server.message}
              </Notice>
            )}
            <ResultsPane program={program} preview={preview} plan={shownPlan} />
          </section>
        </div>
      </FieldErrorsContext>
    </Page>
  );
}
