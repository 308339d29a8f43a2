import { use } from "react";
import { useFieldArray, useFormContext } from "react-hook-form";
import { Button, TextField, FieldError } from "#shared/ui/index";
import { emptyProductRow, type PreviewFormValues } from "../lib/form-values.ts";
import { FieldErrorsContext, fieldId } from "../lib/field-errors.ts";
import { Checkbox } from "./checkbox.tsx";
import { FormSection } from "./form-section.tsx";

/** The engine accepts up to 10 products on one visit. */
const MAX_PRODUCTS = 10;

/** Fertiliser (and other granular products) spread on the visit, from the bag. */
export function ProductFields() {
  const { control, register } = useFormContext<PreviewFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: "visit.products" });
  const errors = use(FieldErrorsContext);

  return (
    <FormSection legend="Products applied">
      {fields.length === 0 && <p className="text-ink-soft">No products on this visit.</p>}
      {fields.map((field, i) => {
        const analysisError = errors[`visit.products.${i}.analysis`];
        return (
          <fieldset key={field.id} className="flex flex-col gap-3 rounded-lg border border-line p-3">
            <legend className="px-1 font-semibold">Product {i + 1}</legend>
            <TextField
              id={fieldId(`visit.products.${i}.name`)}
              label="Name on the bag"
              autoComplete="off"
              error={errors[`visit.products.${i}.name`]}
              {...register(`visit.products.${i}.name`)}
            />
            <fieldset id={fieldId(`visit.products.${i}.analysis`)} tabIndex={-1} className="flex flex-col gap-1">
              <legend className="font-semibold">Analysis (N-P-K, % by weight)</legend>
              <div className="grid grid-cols-3 gap-3">
                {(["n", "p", "k"] as const).map((nutrient) => (
                  <TextField
                    key={nutrient}
                    id={fieldId(`visit.products.${i}.analysis.${nutrient}`)}
                    label={`${nutrient.toUpperCase()} %`}
                    inputMode="decimal"
                    autoComplete="off"
                    error={errors[`visit.products.${i}.analysis.${nutrient}`]}
                    {...register(`visit.products.${i}.analysis.${nutrient}`)}
                  />
                ))}
              </div>
              {analysisError && <FieldError message={analysisError} />}
            </fieldset>
            <TextField
              id={fieldId(`visit.products.${i}.rateLbPer1000`)}
              label="Rate (lb of product per 1,000 ft²)"
              inputMode="decimal"
              autoComplete="off"
              error={errors[`visit.products.${i}.rateLbPer1000`]}
              {...register(`visit.products.${i}.rateLbPer1000`)}
            />
            <Checkbox label="Most of its nitrogen is quick-release" {...register(`visit.products.${i}.quickReleaseN`)} />
            <Checkbox label="Organic (natural) fertilizer" {...register(`visit.products.${i}.organic`)} />
            <Button variant="quiet" className="self-start" onClick={() => remove(i)}>
              Remove product {i + 1}
            </Button>
          </fieldset>
        );
      })}
      {errors["visit.products"] && <FieldError message={errors["visit.products"]} />}
      {fields.length < MAX_PRODUCTS && (
        <Button variant="secondary" className="self-start" onClick={() => append(emptyProductRow())}>
          Add a product
        </Button>
      )}
    </FormSection>
  );
}
