import type { FormEvent } from "react";
import { ProductFields } from "./product-fields.tsx";
import { PropertyFields } from "./property-fields.tsx";
import { SeedMixFields } from "./seed-mix-fields.tsx";
import { VisitFields } from "./visit-fields.tsx";

/**
 * The hypothetical visit and property. There is no submit: the plan follows every
 * change. Enter in a box must not reload the page, hence the prevented submit.
 */
export function PreviewForm() {
  const ignoreSubmit = (event: FormEvent) => event.preventDefault();
  return (
    <form onSubmit={ignoreSubmit} noValidate aria-label="Visit and property" className="flex flex-col gap-6">
      <VisitFields />
      <SeedMixFields />
      <ProductFields />
      <PropertyFields />
    </form>
  );
}
