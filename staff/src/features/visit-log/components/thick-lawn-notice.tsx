import { useFormContext, useWatch } from "react-hook-form";
import { SEEDING_SERVICES } from "#shared/engine/index";
import { Button, Notice } from "#shared/ui/index";
import { useProperty } from "../api/get-property.ts";
import type { VisitFormValues } from "../lib/form-values.ts";
import { isSeedingVisit } from "../lib/prior-pre-emergent.ts";

/**
 * A lawn recorded as thick doesn't need seed: the fall feeding program keeps it thick. The notice
 * says so as soon as the lawn is picked, and offers to turn a seeding into a feeding in one tap.
 */
export function ThickLawnNotice({ propertyId }: { propertyId: number | null }) {
  const { control, setValue, getValues } = useFormContext<VisitFormValues>();
  const visit = useWatch({ control, name: "visit" });
  const property = useProperty(propertyId);
  if (property.data?.lawn.lawnCondition !== "thick") return null;
  const seeding = isSeedingVisit(visit);

  const switchToFeeding = () => {
    const services = getValues("visit.services").filter((s) => !SEEDING_SERVICES.includes(s));
    setValue("visit.services", services.includes("fertiliser_only") ? services : [...services, "fertiliser_only"], { shouldDirty: true });
    setValue("visit.seedMix", [], { shouldDirty: true });
    setValue("visit.seedRateLbPer1000", "", { shouldDirty: true });
  };

  return (
    <Notice title="This lawn is recorded as thick" tone={seeding ? "warning" : "info"}>
      <div data-testid="thick-lawn-notice" className="flex flex-col gap-2">
        <p>
          It doesn't need seed. In the fall its plan lays out the feeding program instead: about 2 lb of nitrogen per 1,000 ft² over the fall, in
          feedings of ¾–1 lb, 4–6 weeks apart. A feeding you put down today counts as the first: log it under Products.
        </p>
        {seeding && (
          <Button variant="secondary" className="self-start" onClick={switchToFeeding}>
            Log a fall feeding instead of seed
          </Button>
        )}
      </div>
    </Notice>
  );
}
