import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { SEED_MIX_SUM_TOLERANCE, SPECIES, SEEDING_SERVICES } from "#shared/engine/index";
import { Button, FieldError, SelectField, speciesLabel } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { seedRowPls, seedTotals } from "../lib/figures.ts";
import { emptySeedRow, fieldId, type VisitFormValues } from "../lib/form-values.ts";
import { formatFigure, parseNumber } from "../lib/numbers.ts";
import { VisitTextField } from "./field.tsx";
import { FormSection } from "./form-section.tsx";

/** The engine takes up to 9 species in one mix. */
const MAX_SPECIES = 9;

/** The seed tag's lines (species, share, purity, germination), the rate, and what that comes to. */
export function SeedFields() {
  const { control, register } = useFormContext<VisitFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "visit.seedMix" });
  const [rows, rate, area, bag, services] = useWatch({ control, name: ["visit.seedMix", "visit.seedRateLbPer1000", "visit.areaFt2", "seedBagLb", "visit.services"] });
  const mixError = useFieldError("visit.seedMix");
  const seeding = services.some((s) => SEEDING_SERVICES.includes(s));
  const totals = seedTotals(rows, rate, area, bag);
  const mixTotal = rows.reduce((sum, row) => sum + (parseNumber(row.percent) || 0), 0);

  return (
    <FormSection legend="Seed" hint={seeding ? "Copy the lines from the seed tag." : "Only for overseeding, slit seeding or new seeding."}>
      {fields.map((field, i) => (
        <SeedRowFields key={field.id} index={i} onRemove={() => remove(i)} register={register} />
      ))}
      <div id={fieldId("visit.seedMix")} tabIndex={-1} aria-live="polite">
        {mixError ? (
          <FieldError message={mixError} />
        ) : (
          rows.length > 0 && <p className={`font-semibold ${Math.abs(mixTotal - 100) > SEED_MIX_SUM_TOLERANCE ? "text-straw-800" : "text-pine-800"}`}>The shares add up to {formatFigure(mixTotal)} %{Math.abs(mixTotal - 100) > SEED_MIX_SUM_TOLERANCE && " so far"}</p>
        )}
      </div>
      {fields.length < MAX_SPECIES && (
        <Button variant="secondary" className="self-start" onClick={() => append(emptySeedRow())}>
          Add a seed line
        </Button>
      )}
      {(fields.length > 0 || seeding) && (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <VisitTextField path="visit.seedRateLbPer1000" label="Seed rate (lb of bulk seed per 1,000 ft²)" numeric />
            <VisitTextField path="seedBagLb" label="Seed bag size (lb)" numeric />
          </div>
          <p aria-live="polite" className="rounded-lg bg-pine-50 p-3" data-testid="seed-totals">
            {totals ? (
              <>
                <strong>{formatFigure(totals.bulkLb)} lb of seed</strong>
                {totals.bags !== null && <> — {totals.bags} {totals.bags === 1 ? "bag" : "bags"}</>}
                {totals.pureLiveSeedLb !== null && <>, carrying {formatFigure(totals.pureLiveSeedLb)} lb of pure live seed</>}
              </>
            ) : (
              "Enter the rate and the area to see how much seed that is."
            )}
          </p>
        </>
      )}
    </FormSection>
  );
}

function SeedRowFields({ index, onRemove, register }: { index: number; onRemove: () => void; register: ReturnType<typeof useFormContext<VisitFormValues>>["register"] }) {
  const row = useWatch<VisitFormValues, `visit.seedMix.${number}`>({ name: `visit.seedMix.${index}` });
  const speciesError = useFieldError(`visit.seedMix.${index}.species`);
  const pls = row ? seedRowPls(row) : null;
  return (
    <fieldset className="flex flex-col gap-3 rounded-lg border border-line p-3">
      <legend className="px-1 font-semibold">Seed line {index + 1}</legend>
      <SelectField
        id={fieldId(`visit.seedMix.${index}.species`)}
        label="Species"
        placeholderOption="Pick a species"
        error={speciesError}
        options={SPECIES.map((s) => ({ value: s, label: speciesLabel(s) }))}
        {...register(`visit.seedMix.${index}.species`)}
      />
      <div className="grid grid-cols-1 gap-3 min-[400px]:grid-cols-3">
        <VisitTextField path={`visit.seedMix.${index}.percent`} label="Share of mix %" numeric />
        <VisitTextField path={`visit.seedMix.${index}.purityPct`} label="Purity %" numeric />
        <VisitTextField path={`visit.seedMix.${index}.germinationPct`} label="Germination %" numeric />
      </div>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p aria-live="polite">{pls !== null ? <>Pure live seed: <strong>{formatFigure(pls * 100)} %</strong></> : <span className="text-ink-soft">Pure live seed shows once purity and germination are in.</span>}</p>
        <Button variant="quiet" onClick={onRemove}>
          Remove seed line {index + 1}
        </Button>
      </div>
    </fieldset>
  );
}
