import { use } from "react";
import { useFormContext } from "react-hook-form";
import { SERVICES } from "#shared/engine/index";
import { TextField } from "#shared/ui/index";
import type { PreviewFormValues } from "../lib/form-values.ts";
import { FieldErrorsContext, fieldId } from "../lib/field-errors.ts";
import { SERVICE_LABELS } from "#shared/ui/index";
import { Checkbox } from "./checkbox.tsx";
import { CheckboxGroup } from "./checkbox-group.tsx";
import { FormSection } from "./form-section.tsx";

/** When the visit is, what the crew did and how much lawn it covered. */
export function VisitFields() {
  const { register } = useFormContext<PreviewFormValues>();
  const errors = use(FieldErrorsContext);
  return (
    <FormSection legend="The visit">
      <TextField id={fieldId("visit.date")} label="Visit date" type="date" error={errors["visit.date"]} {...register("visit.date")} />
      <CheckboxGroup id={fieldId("visit.services")} legend="Services done" error={errors["visit.services"]}>
        {SERVICES.map((service) => (
          <Checkbox key={service} label={SERVICE_LABELS[service]} value={service} {...register("visit.services")} />
        ))}
      </CheckboxGroup>
      <TextField
        id={fieldId("visit.areaFt2")}
        label="Lawn area treated (ft²)"
        inputMode="decimal"
        autoComplete="off"
        error={errors["visit.areaFt2"]}
        {...register("visit.areaFt2")}
      />
    </FormSection>
  );
}
