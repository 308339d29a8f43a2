import { useTranslation } from "react-i18next";
import { Notice } from "#shared/ui/index";
import { usePlanVisits } from "../api/get-plan-visits.ts";
import { Section } from "./section.tsx";
import { BookedVisitList, upcomingVisits } from "./visit-card.tsx";

/**
 * Today's note of booked visits from today on. It adds to Today rather than leading it, so
 * while loading, or with no visit booked, it takes no room at all.
 */
export function UpcomingVisits({ planId, today }: { planId: number; today: string }) {
  const { t } = useTranslation();
  const query = usePlanVisits(planId);
  if (query.isError && !query.data) {
    return <Notice tone="warning" className="mt-6">{t("visits.loadError")}</Notice>;
  }
  const upcoming = upcomingVisits(query.data ?? [], today);
  if (upcoming.length === 0) return null;
  return (
    <Section title={t("visits.upcomingHeading")}>
      <BookedVisitList planId={planId} visits={upcoming} />
    </Section>
  );
}
