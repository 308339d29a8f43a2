import { useFormContext, useWatch } from "react-hook-form";
import { CheckboxField, Notice } from "#shared/ui/index";
import type { VisitFormValues } from "../lib/form-values.ts";
import { VisitTextField } from "./field.tsx";
import { FormSection } from "./form-section.tsx";

/**
 * The record a regulator asks for when a pesticide or other regulated product is applied.
 * Wind and temperature come from "Conditions" so they are typed once.
 */
export function RegulatedApplicationFields() {
  const { register } = useFormContext<VisitFormValues>();
  const regulated = useWatch<VisitFormValues, "regulated">({ name: "regulated" });
  return (
    <FormSection legend="Regulated application record">
      <Notice tone="warning" title="The product label is the law">
        Follow it and your state's rules. Regulated applications must be recorded by a licensed applicator as your state requires.
      </Notice>
      <CheckboxField label="A regulated product was applied on this visit" hint="For example a weed or insect control product. Wind and temperature above become required." {...register("regulated")} />
      {regulated && (
        <div className="flex flex-col gap-4">
          <VisitTextField path="application.product" label="Product (name on the label)" />
          <div className="grid gap-4 sm:grid-cols-2">
            <VisitTextField path="application.epaRegistrationNo" label="EPA registration number" hint="Or the state number below." />
            <VisitTextField path="application.stateRegistrationNo" label="State registration number" />
          </div>
          <div className="grid gap-4 sm:grid-cols-3">
            <VisitTextField path="application.rate" label="Rate applied" hint="The amount, e.g. 1.5." numeric />
            <VisitTextField path="application.rateUnit" label="Unit of the rate" hint="As on the label, e.g. fl oz per 1,000 ft²." />
            <VisitTextField path="application.areaTreated" label="Area the product went on (ft²)" hint="E.g. 2,000 for the front beds." numeric />
          </div>
          <VisitTextField path="application.target" label="Target pest or weed" />
          <div className="grid gap-4 sm:grid-cols-2">
            <VisitTextField path="application.applicatorName" label="Applicator's name" />
            <VisitTextField path="application.licenceNo" label="Applicator's licence number" />
          </div>
        </div>
      )}
    </FormSection>
  );
}
