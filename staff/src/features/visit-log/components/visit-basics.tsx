import { useFormContext } from "react-hook-form";
import { SERVICES } from "#shared/engine/index";
import { CheckboxField, FieldError, SERVICE_LABELS } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { fieldId, type VisitFormValues } from "../lib/form-values.ts";
import { VisitTextField } from "./field.tsx";
import { FormSection } from "./form-section.tsx";

/** The day, the lawn's size and what was done. */
export function VisitBasics() {
  const { register } = useFormContext<VisitFormValues>();
  const servicesError = useFieldError("visit.services");
  const groupId = fieldId("visit.services");
  return (
    <FormSection legend="The visit">
      <div className="grid gap-4 sm:grid-cols-2">
        <VisitTextField path="visit.date" label="Date" type="date" />
        <VisitTextField path="visit.areaFt2" label="Area treated (ft²)" numeric hint="Filled in from the lawn's size; change it if you did part of it." />
      </div>
      <fieldset id={groupId} tabIndex={-1} aria-describedby={servicesError ? `${groupId}-error` : undefined} className="flex flex-col gap-1">
        <legend className="font-semibold">Services done</legend>
        <div className="grid gap-x-4 sm:grid-cols-2">
          {SERVICES.map((service) => (
            <CheckboxField key={service} label={SERVICE_LABELS[service]} value={service} className="font-normal" {...register("visit.services")} />
          ))}
        </div>
        {servicesError && <FieldError id={`${groupId}-error`} message={servicesError} />}
      </fieldset>
    </FormSection>
  );
}
