import { useFormContext, useWatch } from "react-hook-form";
import { PRE_EMERGENT_INGREDIENTS, PRE_EMERGENT_INGREDIENT_NAMES, PRIOR_PRE_EMERGENT_PRODUCTS, type PriorPreEmergentProduct } from "#shared/engine/index";
import { SelectField } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { fieldId, type PriorPreEmergentAnswer, type VisitFormValues } from "../lib/form-values.ts";
import { isSeedingVisit } from "../lib/prior-pre-emergent.ts";
import { VisitTextField } from "./field.tsx";
import { FormSection } from "./form-section.tsx";

const ANSWERS: readonly { value: Exclude<PriorPreEmergentAnswer["answer"], "">; label: string }[] = [
  { value: "no", label: "No" },
  { value: "yes", label: "Yes" },
  { value: "unknown", label: "Don't know" },
];

const PRODUCT_LABELS: Record<PriorPreEmergentProduct, string> = {
  crabgrass_preventer: "Crabgrass preventer (also with fertilizer)",
  weed_and_feed: "Weed-and-feed (broadleaf weed killer with fertilizer)",
  other_pre_emergent: "Another pre-emergent weed preventer",
};

/**
 * Seeding visits only: a weed preventer put down in the months before may still stop the seed, and
 * the plan warns and holds off more seed if so. Asked of the homeowner at the door; the bag, if kept,
 * names the active ingredient.
 */
export function PriorPreEmergentFields() {
  const { control, register } = useFormContext<VisitFormValues>();
  const visit = useWatch({ control, name: "visit" });
  const answer = visit.priorPreEmergent?.answer ?? "";
  const productError = useFieldError("visit.priorPreEmergent.product");
  const ingredientError = useFieldError("visit.priorPreEmergent.activeIngredient");
  if (!isSeedingVisit(visit)) return null;
  const groupId = fieldId("visit.priorPreEmergent.answer");
  return (
    <FormSection legend="Weed preventer before seeding" hint="Ask the homeowner: most weed preventers stop grass seed too.">
      <fieldset id={groupId} className="flex flex-col gap-1">
        <legend className="font-semibold">Was a crabgrass preventer, weed-and-feed or other weed preventer put down in the last 4 months?</legend>
        <div className="flex flex-wrap gap-x-6">
          {ANSWERS.map((a) => (
            <label key={a.value} className="flex min-h-11 cursor-pointer items-center gap-3">
              <input type="radio" value={a.value} className="size-6 shrink-0 accent-pine-700" {...register("visit.priorPreEmergent.answer")} />
              <span>{a.label}</span>
            </label>
          ))}
        </div>
      </fieldset>
      {answer === "yes" && (
        <>
          <SelectField
            id={fieldId("visit.priorPreEmergent.product")}
            label="What went down"
            placeholderOption="Pick one"
            error={productError}
            options={PRIOR_PRE_EMERGENT_PRODUCTS.map((p) => ({ value: p, label: PRODUCT_LABELS[p] }))}
            {...register("visit.priorPreEmergent.product")}
          />
          <VisitTextField path="visit.priorPreEmergent.appliedOn" label="When it went down" type="date" hint="Roughly is fine, e.g. the 1st of the month." />
          <SelectField
            id={fieldId("visit.priorPreEmergent.activeIngredient")}
            label="Active ingredient (optional, from the bag)"
            placeholderOption="Don't know"
            hint="Siduron and mesotrione are allowed at seeding by some labels; the label decides."
            error={ingredientError}
            options={PRE_EMERGENT_INGREDIENTS.map((i) => ({ value: i, label: capitalise(PRE_EMERGENT_INGREDIENT_NAMES[i]) }))}
            {...register("visit.priorPreEmergent.activeIngredient")}
          />
        </>
      )}
    </FormSection>
  );
}

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
