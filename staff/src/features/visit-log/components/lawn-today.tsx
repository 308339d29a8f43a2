import { useFormContext, useWatch } from "react-hook-form";
import { LAWN_CONDITIONS, SEEDING_SERVICES } from "#shared/engine/index";
import { Button, LAWN_CONDITION_LABELS, Notice, SelectField } from "#shared/ui/index";
import { useFieldError } from "../lib/field-errors.ts";
import { fieldId, type VisitFormValues } from "../lib/form-values.ts";
import { isSeedingVisit } from "../lib/prior-pre-emergent.ts";
import { FormSection } from "./form-section.tsx";
import { LawnOnSiteFields } from "./lawn-on-site-fields.tsx";

/**
 * The lawn as the crew finds it today: saved as the lawn's condition, and the plan follows it.
 * A thick lawn doesn't need seed, so the fall feeding program is offered instead, and a seeding
 * can be turned into a feeding in one tap.
 */
export function LawnToday({ propertyId }: { propertyId: number | null }) {
  const { control, register, setValue, getValues } = useFormContext<VisitFormValues>();
  const [visit, condition] = useWatch({ control, name: ["visit", "lawn.lawnCondition"] });
  const error = useFieldError("lawn.lawnCondition");
  const seeding = isSeedingVisit(visit);

  const switchToFeeding = () => {
    const services = getValues("visit.services").filter((s) => !SEEDING_SERVICES.includes(s));
    setValue("visit.services", services.includes("fertiliser_only") ? services : [...services, "fertiliser_only"], { shouldDirty: true });
    setValue("visit.seedMix", [], { shouldDirty: true });
    setValue("visit.seedRateLbPer1000", "", { shouldDirty: true });
  };

  return (
    <FormSection legend="The lawn today" hint="Saved on the lawn's record and used for this plan and later ones.">
      <SelectField
        id={fieldId("lawn.lawnCondition")}
        label="Lawn condition"
        hint="Filled in from the lawn's record; change it if the lawn looks different today."
        placeholderOption="As recorded"
        error={error}
        options={LAWN_CONDITIONS.map((c) => ({ value: c, label: LAWN_CONDITION_LABELS[c] }))}
        {...register("lawn.lawnCondition")}
      />
      <LawnOnSiteFields propertyId={propertyId} />
      {condition === "thick" && (
        <Notice title="A thick lawn doesn't need seed" tone={seeding ? "warning" : "info"}>
          <div data-testid="thick-lawn-notice" className="flex flex-col gap-2">
            <p>
              In the fall its plan lays out the feeding program instead: about 2 lb of nitrogen per 1,000 ft² over the fall, in feedings of ¾–1 lb,
              4–6 weeks apart. A feeding you put down today counts as the first: log it under Products.
            </p>
            {seeding && (
              <Button variant="secondary" className="self-start" onClick={switchToFeeding}>
                Log a fall feeding instead of seed
              </Button>
            )}
          </div>
        </Notice>
      )}
    </FormSection>
  );
}
