import { useFormContext, useWatch } from "react-hook-form";
import { SelectField, TextField } from "#shared/ui/index";
import { OTHER_TIME_ZONE, type PreviewFormValues } from "../lib/form-values.ts";
import { fieldId, useFieldError } from "../lib/field-errors.ts";
import { COMMON_TIME_ZONES } from "../lib/labels.ts";

const zoneOptions = [...COMMON_TIME_ZONES.map(({ zone, label }) => ({ value: zone, label })), { value: OTHER_TIME_ZONE, label: "Another zone (type it)" }];

/** Common North American zones in a list, and a box for any other IANA zone. */
export function TimeZoneField() {
  const { control, register } = useFormContext<PreviewFormValues>();
  const choice = useWatch({ control, name: "property.timeZone" });
  const error = useFieldError("property.timeZone");
  const typed = choice === OTHER_TIME_ZONE;

  return (
    <div className="flex flex-col gap-3">
      <SelectField
        id={typed ? undefined : fieldId("property.timeZone")}
        label="Time zone"
        hint="Watering times and dates are in the property's own zone."
        error={typed ? undefined : error}
        options={zoneOptions}
        {...register("property.timeZone")}
      />
      {typed && (
        <TextField
          id={fieldId("property.timeZone")}
          label="Zone name"
          hint="An IANA zone name, such as America/Boise."
          autoComplete="off"
          autoCapitalize="none"
          spellCheck={false}
          error={error}
          {...register("property.timeZoneOther")}
        />
      )}
    </div>
  );
}
