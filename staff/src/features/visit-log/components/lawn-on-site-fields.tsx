import { useFormContext } from "react-hook-form";
import { SelectField } from "#shared/ui/index";
import { useProperty } from "../api/get-property.ts";
import { useFieldError } from "../lib/field-errors.ts";
import { fieldId, type VisitFormValues } from "../lib/form-values.ts";
import { SHADE_LABELS, SLOPE_LABELS } from "#shared/ui/index";
import { recordedLawnOnSite, shadeOptions, slopeOptions } from "../lib/lawn-on-site.ts";

/** Slope and shade as seen today (inside "The lawn today"): they change the plan's watering, seed advice and feeding, and are kept on the lawn. */
export function LawnOnSiteFields({ propertyId }: { propertyId: number | null }) {
  const { register } = useFormContext<VisitFormValues>();
  const property = useProperty(propertyId);
  const recorded = recordedLawnOnSite(property.data?.lawn);
  const keep = (label: string | undefined) => (label ? `As recorded: ${label}` : "Not noted");
  return (
    <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          id={fieldId("lawn.slope")}
          label="Slope"
          hint="On slopes the plan waters in short runs and asks about washed-out seed."
          placeholderOption={keep(recorded.slope && SLOPE_LABELS[recorded.slope])}
          error={useFieldError("lawn.slope")}
          options={slopeOptions}
          {...register("lawn.slope")}
        />
        <SelectField
          id={fieldId("lawn.shade")}
          label="Shade"
          hint="Shade calls for shade-tolerant seed and less nitrogen."
          placeholderOption={keep(recorded.shade && SHADE_LABELS[recorded.shade])}
          error={useFieldError("lawn.shade")}
          options={shadeOptions}
          {...register("lawn.shade")}
        />
    </div>
  );
}
