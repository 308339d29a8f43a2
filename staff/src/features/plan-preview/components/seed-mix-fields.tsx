import { use } from "react";
import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { SEED_MIX_SUM_TOLERANCE, SPECIES } from "#shared/engine/index";
import { Button, FieldError, SelectField, TextField } from "#shared/ui/index";
import { emptySeedRow, type PreviewFormValues } from "../lib/form-values.ts";
import { FieldErrorsContext, fieldId } from "../lib/field-errors.ts";
import { speciesLabel } from "../lib/labels.ts";
import { formatFigure } from "../lib/numbers.ts";
import { FormSection } from "./form-section.tsx";

/** The engine accepts up to 9 species in a mix. */
const MAX_SPECIES = 9;
const speciesOptions = SPECIES.map((species) => ({ value: species, label: speciesLabel(species) }));

/** The seed sown: one row per species from the bag's tag, and the rate. */
export function SeedMixFields() {
  const { control, register } = useFormContext<PreviewFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "visit.seedMix" });
  const rows = useWatch({ control, name: "visit.seedMix" });
  const errors = use(FieldErrorsContext);
  const total = rows.reduce((sum, row) => sum + (Number(row.percent) || 0), 0);
  const totalIsRight = Math.abs(total - 100) <= SEED_MIX_SUM_TOLERANCE;
  const mixError = errors["visit.seedMix"];

  return (
    <FormSection legend="Seed">
      <p className="text-base text-ink-soft">From the seed tag. Needed for overseeding, slit seeding and new seeding.</p>
      {fields.map((field, i) => (
        <fieldset key={field.id} id={fieldId(`visit.seedMix.${i}`)} tabIndex={-1} className="flex flex-col gap-3 rounded-lg border border-line p-3">
          <legend className="px-1 font-semibold">Seed {i + 1}</legend>
          <SelectField
            id={fieldId(`visit.seedMix.${i}.species`)}
            label="Species"
            error={errors[`visit.seedMix.${i}.species`]}
            options={speciesOptions}
            {...register(`visit.seedMix.${i}.species`)}
          />
          <div className="grid grid-cols-1 gap-3 min-[400px]:grid-cols-3">
            <TextField
              id={fieldId(`visit.seedMix.${i}.percent`)}
              label="Share of mix %"
              inputMode="decimal"
              autoComplete="off"
              error={errors[`visit.seedMix.${i}.percent`]}
              {...register(`visit.seedMix.${i}.percent`)}
            />
            <TextField
              id={fieldId(`visit.seedMix.${i}.purityPct`)}
              label="Purity %"
              inputMode="decimal"
              autoComplete="off"
              error={errors[`visit.seedMix.${i}.purityPct`]}
              {...register(`visit.seedMix.${i}.purityPct`)}
            />
            <TextField
              id={fieldId(`visit.seedMix.${i}.germinationPct`)}
              label="Germination %"
              inputMode="decimal"
              autoComplete="off"
              error={errors[`visit.seedMix.${i}.germinationPct`]}
              {...register(`visit.seedMix.${i}.germinationPct`)}
            />
          </div>
          <Button variant="quiet" className="self-start" onClick={() => remove(i)}>
            Remove seed {i + 1}
          </Button>
        </fieldset>
      ))}

      <div id={fieldId("visit.seedMix")} tabIndex={-1} aria-live="polite" className="flex flex-col gap-1">
        {/* The engine's message names the total too, so show one or the other. The engine only
            checks the sum once the rest of the visit is valid, hence our own running total. */}
        {mixError ? (
          <FieldError message={mixError} />
        ) : (
          fields.length > 0 &&
          (totalIsRight ? (
            <p className="font-semibold text-pine-800">The mix adds up to {formatFigure(total)} %</p>
          ) : (
            <FieldError message={`The mix adds up to ${formatFigure(total)} %, not 100 %`} />
          ))
        )}
      </div>

      {fields.length < MAX_SPECIES && (
        <Button variant="secondary" className="self-start" onClick={() => append(emptySeedRow(SPECIES.find((species) => !rows.some((row) => row.species === species))))}>
          Add a species
        </Button>
      )}

      <TextField
        id={fieldId("visit.seedRateLbPer1000")}
        label="Seed rate (lb of bulk seed per 1,000 ft²)"
        inputMode="decimal"
        autoComplete="off"
        error={errors["visit.seedRateLbPer1000"]}
        {...register("visit.seedRateLbPer1000")}
      />
    </FormSection>
  );
}
