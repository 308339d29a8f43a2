import { useFieldArray, useFormContext, useWatch } from "react-hook-form";
import { Button, CheckboxField, FieldError } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { productFigures } from "../lib/figures.ts";
import { emptyProductRow, fieldId, type VisitFormValues } from "../lib/form-values.ts";
import { formatFigure } from "../lib/numbers.ts";
import { VisitTextField } from "./field.tsx";
import { FormSection } from "./form-section.tsx";

/** The engine takes up to 10 products on one visit. */
const MAX_PRODUCTS = 10;

/** Fertiliser and other granular products from the bag, with the amount and whole bags for this lawn. */
export function ProductFields() {
  const { control, register } = useFormContext<VisitFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "visit.products" });
  return (
    <FormSection legend="Products applied">
      {fields.length === 0 && <p className="text-ink-soft">No products on this visit.</p>}
      {fields.map((field, i) => (
        <ProductRowFields key={field.id} index={i} onRemove={() => remove(i)} />
      ))}
      {fields.length < MAX_PRODUCTS && (
        <Button variant="secondary" className="self-start" onClick={() => append(emptyProductRow())}>
          Add a product
        </Button>
      )}
      {fields.length > 0 && (
        <CheckboxField
          label="A soil test shows this lawn needs phosphorus"
          hint="Where a place allows phosphorus only with a reason, this is one (new seeding is the other)."
          className="font-normal"
          {...register("visit.soilTestCallsForPhosphorus")}
        />
      )}
    </FormSection>
  );
}

function ProductRowFields({ index, onRemove }: { index: number; onRemove: () => void }) {
  const { register } = useFormContext<VisitFormValues>();
  const [row, area] = useWatch<VisitFormValues, [`visit.products.${number}`, "visit.areaFt2"]>({ name: [`visit.products.${index}`, "visit.areaFt2"] });
  const analysisError = useFieldError(`visit.products.${index}.analysis`);
  const figures = row ? productFigures(row, area) : null;
  return (
    <fieldset className="flex flex-col gap-3 rounded-lg border border-line p-3">
      <legend className="px-1 font-semibold">Product {index + 1}</legend>
      <VisitTextField path={`visit.products.${index}.name`} label="Name on the bag" />
      <fieldset id={fieldId(`visit.products.${index}.analysis`)} tabIndex={-1} className="flex flex-col gap-1">
        <legend className="font-semibold">Analysis (N-P-K, % by weight)</legend>
        <div className="grid grid-cols-3 gap-3">
          <VisitTextField path={`visit.products.${index}.analysis.n`} label="N %" numeric />
          <VisitTextField path={`visit.products.${index}.analysis.p`} label="P %" numeric />
          <VisitTextField path={`visit.products.${index}.analysis.k`} label="K %" numeric />
        </div>
        {analysisError && <FieldError message={analysisError} />}
      </fieldset>
      <div className="grid gap-3 min-[400px]:grid-cols-2">
        <VisitTextField path={`visit.products.${index}.rateLbPer1000`} label="Rate (lb per 1,000 ft²)" numeric />
        <VisitTextField path={`visit.products.${index}.bagLb`} label="Bag size (lb)" numeric />
      </div>
      <CheckboxField label="Most of its nitrogen is quick-release" className="font-normal" {...register(`visit.products.${index}.quickReleaseN`)} />
      <CheckboxField label="Organic (natural) fertilizer" className="font-normal" {...register(`visit.products.${index}.organic`)} />
      <p aria-live="polite" className="rounded-lg bg-pine-50 p-3" data-testid="product-figures">
        {figures ? (
          <>
            <strong>{formatFigure(figures.totalLb)} lb</strong>
            {figures.bags !== null && <> — {figures.bags} {figures.bags === 1 ? "bag" : "bags"}</>}
            {"; "}
            {formatFigure(figures.nPer1000, 2)} lb N per 1,000 ft² ({formatFigure(figures.nTotal)} lb N, {formatFigure(figures.pTotal)} lb P₂O₅, {formatFigure(figures.kTotal)} lb K₂O in all)
          </>
        ) : (
          "Enter the analysis, the rate and the area to see the amount."
        )}
      </p>
      <Button variant="quiet" className="self-start" onClick={onRemove}>
        Remove product {index + 1}
      </Button>
    </fieldset>
  );
}
