import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import type { NumericSettingKey } from "#shared/engine/index";
import { ErrorState, LoadingState, Notice, Page, isApiRequestError, useDebouncedValue } from "#shared/ui/index";
import { useProgram, type ProgramWithBounds } from "./api/get-program.ts";
import { useSamplePlan } from "./api/preview-sample-plan.ts";
import { useSaveProgram } from "./api/save-program.ts";
import { OtherSettings } from "./components/other-settings.tsx";
import { SamplePlanPreview } from "./components/sample-plan-preview.tsx";
import { SaveBar } from "./components/save-bar.tsx";
import { SaveConfirm } from "./components/save-confirm.tsx";
import { SettingRow } from "./components/setting-row.tsx";
import { countMovedMilestones } from "./lib/milestones.ts";
import { sampleVisitInput } from "./lib/sample-visit.ts";
import { settingGroups, settingLabels } from "./lib/setting-labels.ts";
import { changedFields, checkSettings, formValuesOf, type SettingsErrors, type SettingsField, type SettingsFormValues } from "./lib/settings-form.ts";

/** Long enough to skip the keystrokes in "21", short enough to feel live. */
const PREVIEW_DELAY_MS = 300;

/** The company's care-program settings, tuned within the engine's safe bounds and saved as a new version. */
export function ProgramsRoute() {
  const program = useProgram();
  // Kept here, not in the editor: the editor starts afresh once the new version has loaded.
  const [savedVersion, setSavedVersion] = useState<number | null>(null);
  return (
    <Page
      title="Care programs"
      width="wide"
      intro="The settings every new care plan is made from. Each can move only within safe bounds, shown with where they come from. Saving makes a new version; plans that already exist keep theirs."
    >
      {savedVersion !== null && program.data?.version === savedVersion && (
        <Notice tone="success" title={`Saved as version ${savedVersion}`} className="mb-6">
          New care plans use it from now on. Existing plans keep the version they were made with.
        </Notice>
      )}
      {program.isError && <ErrorState title="The care program didn't load" error={program.error} onRetry={() => void program.refetch()} retrying={program.isFetching} />}
      {program.isPending && !program.isError && <LoadingState label="Loading the care program…" />}
      {program.data && <ProgramEditor key={program.data.version} program={program.data} onSaved={setSavedVersion} />}
    </Page>
  );
}

function ProgramEditor({ program, onSaved }: { program: ProgramWithBounds; onSaved: (version: number) => void }) {
  const saved = useMemo(() => formValuesOf(program.settings, program.bounds), [program]);
  const form = useForm<SettingsFormValues>({ defaultValues: saved });
  const values = form.watch();
  const check = checkSettings(values, program.bounds);
  const [serverErrors, setServerErrors] = useState<SettingsErrors>({});
  const errors: SettingsErrors = { ...serverErrors, ...(check.ok ? {} : check.fields) };
  const changed = changedFields(values, saved);

  const preview = useProgramPreview(program, check.ok ? JSON.stringify(check.settings) : null);
  const save = useSaveProgram();
  const [confirming, setConfirming] = useState(false);
  const nextVersion = program.version + 1;

  const confirmSave = () => {
    if (!check.ok) return;
    save.mutate(check.settings, {
      onSuccess: ({ version }) => {
        setConfirming(false);
        onSaved(version);
      },
      onError: (error) => {
        if (isApiRequestError(error)) setServerErrors(settingsFieldsOf(error.fields));
      },
    });
  };

  return (
    <form noValidate onSubmit={(e) => e.preventDefault()} className="flex flex-col gap-6">
      <a href="#program-preview-heading" className="inline-flex min-h-11 items-center font-semibold lg:hidden">
        Jump to the sample plan
      </a>
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1.4fr)_minmax(0,1fr)] lg:items-start">
        <div className="flex min-w-0 flex-col gap-8">
          <p className="text-ink-soft">
            Editing version {program.version}. Numbers outside the safe range are marked; “Use …” puts them back to the nearest bound.
          </p>
          {settingGroups.map((group) => (
            <section key={group.id} aria-labelledby={`program-${group.id}`} className="flex flex-col gap-3">
              <h2 id={`program-${group.id}`} className="text-2xl text-pine-900">
                {group.title}
              </h2>
              <ul className="flex flex-col gap-3">
                {group.keys
                  .filter((key) => program.bounds[key])
                  .map((key) => (
                    <SettingRow
                      key={key}
                      label={settingLabels[key]}
                      bound={program.bounds[key]!}
                      registration={form.register(key, { onChange: () => clearServerError(key) })}
                      error={errors[key]}
                      savedValue={saved[key]}
                      changed={changed.includes(key)}
                      typedValue={values[key]}
                      onClamp={(value) => form.setValue(key, String(value), { shouldDirty: true })}
                    />
                  ))}
              </ul>
            </section>
          ))}
          <OtherSettings register={form.register} errors={errors} />
        </div>
        <div className="min-w-0 lg:sticky lg:top-4">
          <SamplePlanPreview version={program.version} current={preview.current} edited={preview.edited} stale={!check.ok} />
        </div>
      </div>
      <SaveBar
        nextVersion={nextVersion}
        changedCount={changed.length}
        hasErrors={!check.ok}
        onSave={() => {
          save.reset();
          setConfirming(true);
        }}
        previewChanges={countMovedMilestones(preview.current.data, preview.edited.data)}
        onDiscard={() => {
          form.reset(saved);
          setServerErrors({});
        }}
      />
      <SaveConfirm
        open={confirming}
        version={nextVersion}
        changedLabels={changed.map(labelOf)}
        pending={save.isPending}
        error={save.error ? saveErrorMessage(save.error) : null}
        onConfirm={confirmSave}
        onCancel={() => setConfirming(false)}
      />
    </form>
  );

  function clearServerError(key: SettingsField) {
    if (serverErrors[key]) setServerErrors(({ [key]: _dropped, ...rest }) => rest);
  }
}

/**
 * The sample job under the program in force and under the edited settings. While the
 * form has errors the last valid settings stay, so the preview doesn't blank out.
 */
function useProgramPreview(program: ProgramWithBounds, validSettingsJson: string | null) {
  const debounced = useDebouncedValue(validSettingsJson, PREVIEW_DELAY_MS);
  const [lastGood, setLastGood] = useState(() => JSON.stringify(program.settings));
  if (debounced !== null && debounced !== lastGood) setLastGood(debounced);
  const currentInput = useMemo(() => sampleVisitInput(program.settings), [program.settings]);
  const editedInput = useMemo(() => sampleVisitInput({ ...(JSON.parse(lastGood) as object), version: program.version + 1 }), [lastGood, program.version]);
  return { current: useSamplePlan(currentInput), edited: useSamplePlan(editedInput) };
}

const otherLabels: Record<string, string> = {
  checkInPhotoDays: "Extra check-in photo days",
  germinationWateringTimes: "Light watering start times",
  deepWateringTime: "Deep watering start time",
};
const labelOf = (field: SettingsField) => settingLabels[field as NumericSettingKey] ?? otherLabels[field] ?? field;

/** The server may name fields "settings.x" (the body's shape) or "x". */
function settingsFieldsOf(fields: Record<string, string>): SettingsErrors {
  return Object.fromEntries(Object.entries(fields).map(([path, message]) => [path.replace(/^settings\./, "").split(".")[0], message]));
}

function saveErrorMessage(error: unknown): string {
  if (isApiRequestError(error) && error.status === 404) return "This server can't save program versions yet. Nothing was changed; try again after the next update.";
  if (isApiRequestError(error) && Object.keys(error.fields).length > 0) return "Some settings were refused; they are marked on the page.";
  return isApiRequestError(error) ? error.message : "Something unexpected went wrong. Please try again.";
}
