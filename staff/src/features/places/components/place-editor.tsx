import { useEffect, useRef, useState } from "react";
import { useFieldArray, useForm, type UseFormRegister } from "react-hook-form";
import type { Place } from "#shared/schemas/place-rules";
import { Button, CheckboxField, FieldError, Notice, SelectField, TextField, isApiRequestError } from "#shared/ui/index";
import { useSavePlace } from "../api/save-place.ts";
import { MONTH_NAMES, WEEKDAY_NAMES, WEEK_ORDER } from "../lib/describe.ts";
import { checkPlace, emptyPlace, errorAt, formValuesOf, type PlaceErrors, type PlaceFormValues } from "../lib/place-form.ts";
import { PlaceSample } from "./place-sample.tsx";

const monthOptions = MONTH_NAMES.map((label, i) => ({ value: String(i + 1), label }));

export interface PlaceEditorProps {
  /** null: a new place. */
  place: Place | null;
  onDone: (savedName: string | null) => void;
}

/** One place's rules, with a sample plan beside them that shows what they change. */
export function PlaceEditor({ place, onDone }: PlaceEditorProps) {
  const form = useForm<PlaceFormValues>({ defaultValues: place ? formValuesOf(place) : emptyPlace });
  const blackouts = useFieldArray({ control: form.control, name: "blackouts" });
  const values = form.watch();
  const check = checkPlace(values);
  const [serverErrors, setServerErrors] = useState<PlaceErrors>({});
  const [submitted, setSubmitted] = useState(false);
  // Errors show once the manager tries to save, or at once for a field the server refused.
  const errors: PlaceErrors = { ...serverErrors, ...(submitted && !check.ok ? check.errors : {}) };
  const save = useSavePlace();
  const [formError, setFormError] = useState<string | null>(null);
  // Each refused attempt moves focus to the message above the form, so keyboard and screen-reader users hear why.
  const [attempts, setAttempts] = useState(0);
  const messagesRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (attempts > 0) messagesRef.current?.focus();
  }, [attempts]);

  const submit = form.handleSubmit(() => {
    setSubmitted(true);
    setFormError(null);
    if (!check.ok) {
      setAttempts((n) => n + 1);
      return;
    }
    save.mutate(
      { id: place?.id ?? null, body: check.place },
      {
        onSuccess: (saved) => onDone(saved.name),
        onError: (error) => {
          if (isApiRequestError(error) && Object.keys(error.fields).length > 0) {
            setServerErrors(error.fields);
            setFormError("Some rules were refused; they are marked below.");
          } else {
            setFormError(isApiRequestError(error) ? error.message : "Something unexpected went wrong. Please try again.");
          }
          setAttempts((n) => n + 1);
        },
      },
    );
  });

  const register: UseFormRegister<PlaceFormValues> = (name, options) =>
    form.register(name, {
      ...options,
      onChange: () => {
        if (Object.keys(serverErrors).length > 0) setServerErrors({});
      },
    });

  const headingId = "place-editor-heading";
  return (
    <section aria-labelledby={headingId} className="grid gap-8 lg:grid-cols-[minmax(0,1.2fr)_minmax(0,1fr)] lg:items-start">
      <form noValidate onSubmit={(e) => void submit(e)} className="flex min-w-0 flex-col gap-6">
        <h2 id={headingId} className="text-2xl text-pine-900">
          {place ? `Edit ${place.name}` : "Add a place"}
        </h2>
        <div ref={messagesRef} tabIndex={-1} className="flex flex-col gap-2 scroll-mt-4 outline-none empty:hidden">
          {formError && <Notice tone="danger">{formError}</Notice>}
          {submitted && !check.ok && <Notice tone="warning">Fix the marked rules to save.</Notice>}
        </div>

        <fieldset className="flex flex-col gap-4">
          <legend className="mb-2 text-xl">Where</legend>
          <TextField label="Name" hint="As your team calls it, e.g. a county or a water district." error={errorAt(errors, "name")} {...register("name")} />
          <div className="grid gap-4 sm:grid-cols-[8rem_minmax(0,1fr)] sm:items-start">
            <TextField label="State" hint="2-letter code" autoCapitalize="characters" maxLength={3} error={errorAt(errors, "region")} {...register("region")} />
            <TextField
              label="ZIP codes starting with"
              hint="Optional, separated by commas. Empty: the whole state. The longest matching start wins."
              inputMode="numeric"
              error={errorAt(errors, "zipPrefixes")}
              {...register("zipText")}
            />
          </div>
        </fieldset>

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-2 text-xl">Fertilizer blackout dates</legend>
          <p className="text-ink-soft">Every year, both days included. A window may run over New Year (December 1 to February 28).</p>
          {blackouts.fields.length === 0 && <p className="text-ink-soft">No blackout dates: fertilizer any time of year.</p>}
          <ul className="flex flex-col gap-3">
            {blackouts.fields.map((field, i) => (
              <BlackoutRow key={field.id} index={i} register={register} errors={errors} onRemove={() => blackouts.remove(i)} />
            ))}
          </ul>
          {blackouts.fields.length < 6 && (
            <Button variant="secondary" className="self-start" onClick={() => blackouts.append({ fromMonth: "11", fromDay: "15", toMonth: "3", toDay: "1" })}>
              Add a blackout window
            </Button>
          )}
        </fieldset>

        <SelectField
          label="Phosphorus"
          hint="Starter fertilizers and many balanced ones contain phosphorus (the middle number on the bag). The reasons a place may accept: new seeding, or a soil test showing a need."
          options={[
            { value: "allowed", label: "Allowed" },
            { value: "needs_reason", label: "Only with a reason" },
          ]}
          error={errorAt(errors, "phosphorus")}
          {...register("phosphorus")}
        />

        <fieldset className="flex flex-col gap-3">
          <legend className="mb-2 text-xl">Watering days</legend>
          <CheckboxField label="Watering is allowed only on some days" {...register("limitWatering")} />
          {values.limitWatering && (
            <>
              <fieldset id="place-weekdays" tabIndex={-1} className="flex flex-col gap-1">
                <legend className="font-semibold">Allowed days</legend>
                <div className="grid grid-cols-2 gap-x-4 sm:grid-cols-4">
                  {WEEK_ORDER.map((d) => (
                    <CheckboxField key={d} label={WEEKDAY_NAMES[d]} value={String(d)} {...register("weekdays")} />
                  ))}
                </div>
                {errorAt(errors, "watering.allowedWeekdays") && <FieldError message={errorAt(errors, "watering.allowedWeekdays")!} />}
              </fieldset>
              <TextField
                label="New lawns may be watered any day for (days)"
                hint="Some water utilities exempt new seed or sod for a few weeks; 0 if this place doesn't."
                inputMode="numeric"
                error={errorAt(errors, "watering.newLawnExemptDays")}
                {...register("exemptDays")}
              />
            </>
          )}
        </fieldset>

        <CheckboxField label="This is an example, not a real place's rules" hint="Shown with an Example mark so no one mistakes it for the law." {...register("isExample")} />

        <div className="flex flex-wrap gap-2">
          <Button type="submit" pending={save.isPending} pendingLabel="Saving…">
            {place ? "Save changes" : "Add place"}
          </Button>
          <Button variant="secondary" onClick={() => onDone(null)}>
            Cancel
          </Button>
        </div>
      </form>
      <div className="min-w-0 lg:sticky lg:top-4">
        <PlaceSample place={check.ok ? check.place : null} />
      </div>
    </section>
  );
}

function BlackoutRow({ index, register, errors, onRemove }: { index: number; register: UseFormRegister<PlaceFormValues>; errors: PlaceErrors; onRemove: () => void }) {
  const fromError = errorAt(errors, `fertilizerBlackouts.${index}.from`);
  const toError = errorAt(errors, `fertilizerBlackouts.${index}.to`);
  return (
    <li className="rounded-lg border border-line bg-surface p-3">
      <fieldset className="flex flex-col gap-2">
        <legend className="font-semibold">Window {index + 1}</legend>
        <div className="grid grid-cols-[minmax(0,1fr)_6rem] gap-2">
          <SelectField label="From month" options={monthOptions} {...register(`blackouts.${index}.fromMonth`)} />
          <TextField label="From day" inputMode="numeric" error={fromError} {...register(`blackouts.${index}.fromDay`)} />
          <SelectField label="To month" options={monthOptions} {...register(`blackouts.${index}.toMonth`)} />
          <TextField label="To day" inputMode="numeric" error={toError} {...register(`blackouts.${index}.toDay`)} />
        </div>
        <Button variant="quiet" className="self-start" onClick={onRemove}>
          Remove window {index + 1}
        </Button>
      </fieldset>
    </li>
  );
}
