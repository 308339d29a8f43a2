import { useTranslation } from "react-i18next";
import { Notice } from "#shared/ui/index";
import { usePlanVisits } from "../api/get-plan-visits.ts";
import { Section } from "./section.tsx";
import { BookedVisitCard } from "./visit-card.tsx";

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
  const upcoming = (query.data ?? []).filter((v) => v.status === "scheduled" && v.scheduledFor !== null && v.scheduledFor >= today);
  if (upcoming.length === 0) return null;
  return (
    <Section title={t("visits.upcomingHeading")}>
      <ul className="space-y-4">
        {upcoming.map((visit) => (
          <li key={visit.id}>
            <BookedVisitCard planId={planId} visit={visit} />
          </li>
        ))}
      </ul>
    </Section>
  );
}
