import { useTranslation } from "react-i18next";
import { usePlanVisits } from "../api/get-plan-visits.ts";
import { formatLongDate } from "../lib/dates.ts";
import { QueryFallback } from "./query-fallback.tsx";
import { Section } from "./section.tsx";
import { BookedVisitList, upcomingVisits } from "./visit-card.tsx";

/** The plan's visits: those booked, on their dates, and the history of what was done. */
export function PlanVisits({ planId, today }: { planId: number; today: string }) {
  const { t, i18n } = useTranslation();
  const query = usePlanVisits(planId);
  const visits = query.data;
  if (!visits) {
    return (
      <Section title={t("visits.heading")}>
        <QueryFallback query={query} loadingLabel={t("visits.loading")} errorTitle={t("visits.loadError")} />
      </Section>
    );
  }
  const upcoming = upcomingVisits(visits, today);
  const past = visits.filter((v) => v.status !== "scheduled").reverse();
  return (
    <Section title={t("visits.heading")}>
      {upcoming.length === 0 && past.length === 0 && <p className="text-ink-soft">{t("visits.none")}</p>}
      {upcoming.length > 0 && <BookedVisitList planId={planId} visits={upcoming} />}
      {past.length > 0 && (
        <>
          <h3 className="mb-2 mt-6 text-xl text-pine-900">{t("visits.pastHeading")}</h3>
          <ul className="space-y-3">
            {past.map((visit) => (
              <li key={visit.id} className="rounded-lg border border-line bg-surface p-3">
                {visit.scheduledFor && <p className="font-bold">{formatLongDate(visit.scheduledFor, i18n.language)}</p>}
                <p>{t("visits.why", { reason: t(`visits.reasons.${visit.reason}`) })}</p>
                {visit.workDone ? (
                  <p className="mt-1">
                    <span className="font-semibold">{t("visits.workDone")}: </span>
                    <span className="whitespace-pre-line">{visit.workDone}</span>
                  </p>
                ) : (
                  <p className="mt-1">{t("visits.noWorkRecorded")}</p>
                )}
              </li>
            ))}
          </ul>
        </>
      )}
    </Section>
  );
}
