import { use } from "react";
import { useFormContext, useWatch } from "react-hook-form";
import { SHADE_LEVELS, SLOPES, SPECIES, SPRINKLER_TYPES } from "#shared/engine/index";
import { FieldError, SelectField, TextField } from "#shared/ui/index";
import type { IrrigationKind, LawnCondition, PreviewFormValues } from "../lib/form-values.ts";
import { FieldErrorsContext, fieldId } from "../lib/field-errors.ts";
import { LAWN_CONDITION_LABELS, SHADE_LABELS, SLOPE_LABELS } from "#shared/ui/index";
import { IRRIGATION_LABELS, SPRINKLER_TYPE_LABELS, speciesLabel } from "../lib/labels.ts";
import { daysAfter } from "../lib/local-dates.ts";
import { Checkbox } from "./checkbox.tsx";
import { CheckboxGroup } from "./checkbox-group.tsx";
import { FormSection } from "./form-section.tsx";
import { TimeZoneField } from "./time-zone-field.tsx";

const seasonOptions = [
  { value: "cool", label: "Cool-season" },
  { value: "warm", label: "Warm-season" },
];
const conditionOptions = (Object.keys(LAWN_CONDITION_LABELS) as LawnCondition[]).map((value) => ({ value, label: LAWN_CONDITION_LABELS[value] }));
const irrigationOptions = (Object.keys(IRRIGATION_LABELS) as IrrigationKind[]).map((value) => ({ value, label: IRRIGATION_LABELS[value] }));
const slopeOptions = SLOPES.map((value) => ({ value, label: SLOPE_LABELS[value] }));
const shadeOptions = SHADE_LEVELS.map((value) => ({ value, label: SHADE_LABELS[value] }));
const sprinklerTypeOptions = SPRINKLER_TYPES.map((value) => ({ value, label: SPRINKLER_TYPE_LABELS[value] }));

/** The lawn, its watering and its mower, and where it is. */
export function PropertyFields() {
  const { control, register } = useFormContext<PreviewFormValues>();
  const errors = use(FieldErrorsContext);
  const [irrigationKind, visitDate, frost] = useWatch({
    control,
    name: ["property.irrigation.kind", "visit.date", "property.expectedFirstFrost"],
  });
  const daysToFrost = daysAfter(visitDate, frost);
  const irrigationError = errors["property.irrigation"];

  return (
    <FormSection legend="The property">
      <CheckboxGroup
        id={fieldId("property.grassType.species")}
        legend="Grass in the lawn now"
        hint="Tick what grows there, or leave them all empty and pick the season below."
        error={errors["property.grassType.species"] ?? errors["property.grassType"]}
      >
        {SPECIES.map((species) => (
          <Checkbox key={species} label={speciesLabel(species)} value={species} {...register("property.grassType.species")} />
        ))}
      </CheckboxGroup>
      <SelectField
        id={fieldId("property.grassType.season")}
        label="Grass season"
        error={errors["property.grassType.season"]}
        placeholderOption="Work it out from the species"
        options={seasonOptions}
        {...register("property.grassType.season")}
      />
      <SelectField id={fieldId("property.lawnCondition")} label="Lawn condition" error={errors["property.lawnCondition"]} options={conditionOptions} {...register("property.lawnCondition")} />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField id={fieldId("property.slope")} label="Slope" placeholderOption="Not noted" error={errors["property.slope"]} options={slopeOptions} {...register("property.slope")} />
        <SelectField id={fieldId("property.shade")} label="Shade" placeholderOption="Not noted" error={errors["property.shade"]} options={shadeOptions} {...register("property.shade")} />
      </div>

      <SelectField id={fieldId("property.irrigation.kind")} label="Watering" error={errors["property.irrigation.kind"]} options={irrigationOptions} {...register("property.irrigation.kind")} />
      {irrigationKind !== "none" && (
        <>
          <SelectField
            id={fieldId("property.irrigation.sprinklerType")}
            label="Sprinkler type"
            hint="Sets the default watering rate until a catch-cup test measures it."
            error={errors["property.irrigation.sprinklerType"]}
            placeholderOption="Not known"
            options={sprinklerTypeOptions}
            {...register("property.irrigation.sprinklerType")}
          />
          <TextField
            id={fieldId("property.irrigation.zones")}
            label="Zones (optional)"
            inputMode="numeric"
            autoComplete="off"
            error={errors["property.irrigation.zones"]}
            {...register("property.irrigation.zones")}
          />
          <TextField
            id={fieldId("property.irrigation.precipitationRateInPerHour")}
            label="Precipitation rate (in/h)"
            hint="From a catch-cup test. Leave empty if unknown: the sprinkler type's typical rate, or else the program's default, is used."
            inputMode="decimal"
            autoComplete="off"
            error={errors["property.irrigation.precipitationRateInPerHour"]}
            {...register("property.irrigation.precipitationRateInPerHour")}
          />
        </>
      )}
      {irrigationError && <FieldError message={irrigationError} />}

      <TextField
          id={fieldId("property.currentMowingHeightIn")}
          label="Mowing height now (in)"
          inputMode="decimal"
          autoComplete="off"
          error={errors["property.currentMowingHeightIn"]}
          {...register("property.currentMowingHeightIn")}
        />
        <TextField
          id={fieldId("property.mowerHighestSettingIn")}
          label="Mower's highest setting (in)"
          inputMode="decimal"
          autoComplete="off"
          error={errors["property.mowerHighestSettingIn"]}
          {...register("property.mowerHighestSettingIn")}
        />
        <TextField
          id={fieldId("property.mowerSettingStepIn")}
          label="Mower step (in, optional)"
          inputMode="decimal"
          autoComplete="off"
          error={errors["property.mowerSettingStepIn"]}
          {...register("property.mowerSettingStepIn")}
        />

      <TimeZoneField />

      <TextField
        id={fieldId("property.expectedFirstFrost")}
        label="Expected first frost (optional)"
        type="date"
        hint={
          daysToFrost !== null
            ? `${daysToFrost} days after the visit. Leave empty where frost doesn't come.`
            : "Leave empty where frost doesn't come."
        }
        error={errors["property.expectedFirstFrost"]}
        {...register("property.expectedFirstFrost")}
      />
    </FormSection>
  );
}
