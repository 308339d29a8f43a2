import { useFormContext } from "react-hook-form";
import { SelectField } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { WIND_DIRECTIONS, fieldId, type VisitFormValues } from "../lib/form-values.ts";
import { VisitTextField } from "./field.tsx";
import { FormSection } from "./form-section.tsx";

const directionLabels: Record<(typeof WIND_DIRECTIONS)[number], string> = {
  calm: "Calm",
  N: "From the north",
  NE: "From the north-east",
  E: "From the east",
  SE: "From the south-east",
  S: "From the south",
  SW: "From the south-west",
  W: "From the west",
  NW: "From the north-west",
  variable: "Variable",
};

/** Weather at the time of the visit; required when a regulated product went down. */
export function ConditionsFields() {
  const { register } = useFormContext<VisitFormValues>();
  return (
    <FormSection legend="Conditions">
      <div className="grid gap-4 sm:grid-cols-3">
        <VisitTextField path="conditions.temperatureF" label="Temperature (°F)" numeric />
        <VisitTextField path="conditions.windMph" label="Wind speed (mph)" numeric />
        <SelectField
          id={fieldId("conditions.windDirection")}
          label="Wind direction"
          placeholderOption="Not noted"
          error={useFieldError("conditions.windDirection")}
          options={WIND_DIRECTIONS.map((d) => ({ value: d, label: directionLabels[d] }))}
          {...register("conditions.windDirection")}
        />
      </div>
    </FormSection>
  );
}
