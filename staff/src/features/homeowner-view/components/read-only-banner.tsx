import { Link } from "react-router-dom";
import type { HomeownerViewResponse } from "#shared/schemas/homeowner-view";

/** Says plainly whose screen this is and that nothing here changes it. Stays in view while scrolling. */
export function ReadOnlyBanner({ homeowner }: { homeowner: HomeownerViewResponse["homeowner"] }) {
  return (
    <div role="note" aria-label="Read-only view" className="sticky top-0 z-10 mb-6 rounded-lg border-2 border-straw-800 bg-straw-50 p-4 text-straw-800">
      <p className="text-lg font-bold">Viewing as {homeowner.name} — read only</p>
      <p>
        This is what {homeowner.name} sees in the homeowner portal. Nothing here changes their plan.{" "}
        <Link to={`/customers/${homeowner.customerId}`} className="font-semibold text-straw-800">
          Back to the customer page
        </Link>
      </p>
    </div>
  );
}
