import { useEffect, useState } from "react";
import { FormProvider, useForm } from "react-hook-form";
import { useQueryClient } from "@tanstack/react-query";
import { LAWN_CONDITIONS, type LawnCondition } from "#shared/engine/index";
import { Button, Notice, Page, TextAreaField, isApiRequestError, useSignedInUser } from "#shared/ui/index";
import { propertyQueryOptions } from "./api/get-property.ts";
import { useLogVisit } from "./api/log-visit.ts";
import { ConditionsFields } from "./components/conditions-fields.tsx";
import { ErrorSummary } from "./components/error-summary.tsx";
import { FormSection } from "./components/form-section.tsx";
import { PriorPreEmergentFields } from "./components/prior-pre-emergent-fields.tsx";
import { ProductFields } from "./components/product-fields.tsx";
import { PropertyPicker } from "./components/property-picker.tsx";
import { RegulatedApplicationFields } from "./components/regulated-application-fields.tsx";
import { SeedFields } from "./components/seed-fields.tsx";
import { LawnToday } from "./components/lawn-today.tsx";
import { VisitBasics } from "./components/visit-basics.tsx";
import { VisitSaved, type SavedVisit } from "./components/visit-saved.tsx";
import { VisitWarnings } from "./components/visit-warnings.tsx";
import type { ChosenLawn } from "./lib/chosen-lawn.ts";
import { toFormFields } from "./lib/application-record.ts";
import { clearDraft, loadDraft, saveDraft } from "./lib/draft.ts";
import { VisitErrorsContext } from "./lib/field-errors.ts";
import { defaultVisitForm, fieldId, type VisitFormValues } from "./lib/form-values.ts";
import { checkVisitForm, type FormFieldErrors } from "./lib/to-log-visit.ts";

const draftStamp = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });

/** Log a visit in the field, on a phone: what was done, seed and products with live amounts, conditions. */
export function VisitLogRoute() {
  const user = useSignedInUser();
  const queryClient = useQueryClient();
  const [draft] = useState(loadDraft);
  const [showRestored, setShowRestored] = useState(Boolean(draft));
  const [lawn, setLawn] = useState<ChosenLawn | null>(draft?.lawn ?? null);
  const form = useForm<VisitFormValues>({ defaultValues: draft?.values ?? defaultVisitForm(user.name) });
  const values = form.watch();
  const [submitted, setSubmitted] = useState(false);
  const [serverFields, setServerFields] = useState<FormFieldErrors>({});
  const [formMessage, setFormMessage] = useState<string | null>(null);
  const [saved, setSaved] = useState<SavedVisit | null>(null);
  const logVisit = useLogVisit();

  // Keep the half-logged visit on this device, a moment after each change.
  const valuesJson = JSON.stringify(values);
  const dirty = form.formState.isDirty;
  useEffect(() => {
    if (!dirty && !lawn) return;
    const timer = setTimeout(() => saveDraft(JSON.parse(valuesJson) as VisitFormValues, lawn), 400);
    return () => clearTimeout(timer);
  }, [valuesJson, lawn, dirty]);

  // After the first save attempt the messages follow the typing, so a fixed field clears at once.
  const check = submitted ? checkVisitForm(values) : null;
  const errors: FormFieldErrors = { ...serverFields, ...(check && !check.ok ? check.fields : {}) };

  const chooseLawn = (next: ChosenLawn | null) => {
    setLawn(next);
    form.setValue("propertyId", next ? String(next.propertyId) : "", { shouldDirty: true });
    if (!next) return;
    // The lawn's recorded size is the usual area; a technician who did part of it changes it.
    queryClient
      .fetchQuery(propertyQueryOptions(next.propertyId))
      .then((property) => {
        if (!form.getValues("visit.areaFt2") && property.lawnAreaFt2) form.setValue("visit.areaFt2", String(property.lawnAreaFt2), { shouldDirty: true });
        // Likewise the lawn's recorded condition, for the technician to confirm or correct.
        const recorded = property.lawn.lawnCondition;
        if (!form.getValues("lawn.lawnCondition") && isLawnCondition(recorded)) form.setValue("lawn.lawnCondition", recorded, { shouldDirty: true });
      })
      .catch(() => undefined);
  };

  const startOver = () => {
    clearDraft();
    form.reset(defaultVisitForm(user.name));
    setLawn(null);
    setSubmitted(false);
    setServerFields({});
    setFormMessage(null);
    setShowRestored(false);
  };

  const onSubmit = form.handleSubmit((current) => {
    setSubmitted(true);
    setServerFields({});
    setFormMessage(null);
    const checked = checkVisitForm(current);
    if (!checked.ok) return focusFirst(Object.keys(checked.fields));
    // Kept on the device right now, not after the usual pause: the save may fail and the tab close.
    saveDraft(current, lawn);
    logVisit.mutate(checked.body, {
      onSuccess: ({ visitId, planId, invitationSent, welcomeChannels }) => {
        setSaved({ visitId, planId, invitationSent, welcomeChannels, lawn: lawn!, date: current.visit.date });
        startOver();
        window.scrollTo({ top: 0 });
      },
      // Everything typed stays in the form (and on the device), whatever went wrong.
      onError: (error) => {
        const fields = isApiRequestError(error) ? toFormFields(error.fields) : {};
        setServerFields(fields);
        setFormMessage(isApiRequestError(error) ? error.message : "The visit wasn't saved. Please try again.");
        focusFirst(Object.keys(fields));
      },
    });
  });

  if (saved) return <VisitSaved saved={saved} onLogAnother={() => setSaved(null)} />;

  return (
    <Page title="Log a visit" intro="What you did on the lawn today. Saving creates the homeowner's care plan.">
      <VisitErrorsContext value={errors}>
        <FormProvider {...form}>
          <form noValidate onSubmit={onSubmit} className="flex flex-col gap-5">
            {showRestored && draft && (
              <Notice title="Picked up where you left off">
                <p>This visit was kept on this device ({draftStamp.format(new Date(draft.savedAt))}).</p>
                <Button variant="secondary" className="mt-2" onClick={startOver}>
                  Start a new visit
                </Button>
              </Notice>
            )}
            <FormSection legend="Customer and lawn">
              <PropertyPicker chosen={lawn} onChoose={chooseLawn} error={errors.propertyId} />
            </FormSection>
            <VisitBasics />
            <LawnToday propertyId={lawn?.propertyId ?? null} />
            <SeedFields />
            <PriorPreEmergentFields />
            <ProductFields />
            <VisitWarnings propertyId={lawn?.propertyId ?? null} />
            <ConditionsFields />
            <RegulatedApplicationFields />
            <FormSection legend="Notes">
              <TextAreaField id={fieldId("notes")} label="Notes for the record (optional)" error={errors.notes} {...form.register("notes")} />
            </FormSection>
            <ErrorSummary fields={errors} />
            {formMessage && (
              <Notice tone="danger" title="The visit wasn't saved">
                {formMessage} Everything you typed is still here.
              </Notice>
            )}
            <Button type="submit" className="w-full sm:w-auto sm:self-start" pending={logVisit.isPending} pendingLabel="Saving…">
              Save visit
            </Button>
          </form>
        </FormProvider>
      </VisitErrorsContext>
    </Page>
  );
}

/** Focuses the first field with a message, in the order the form shows them. */
function focusFirst(paths: string[]) {
  const ids = new Set(paths.map(fieldId));
  const target = [...document.querySelectorAll<HTMLElement>("main [id]")].find((el) => ids.has(el.id));
  target?.scrollIntoView({ block: "center" });
  target?.focus({ preventScroll: true });
}

const isLawnCondition = (value: unknown): value is LawnCondition => (LAWN_CONDITIONS as readonly unknown[]).includes(value);
