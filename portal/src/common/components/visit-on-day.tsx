import { useTranslation } from "react-i18next";
import type { PlanVisit } from "#shared/schemas/follow-ups";
import { useSignedInUser } from "#shared/ui/index";
import { formatClock } from "../lib/dates.ts";

/** A visit in the day-by-day plan: one line on its day, with the window and, once done, what was done. */
export function VisitOnDay({ visit }: { visit: PlanVisit }) {
  const { t, i18n } = useTranslation();
  const user = useSignedInUser();
  return (
    <div className="py-3">
      <p className="font-bold text-pine-900">{t("visits.onThisDay", { company: user.companyName })}</p>
      {visit.arrivalStart && visit.arrivalEnd && (
        <p>{t("visits.window", { start: formatClock(visit.arrivalStart, i18n.language), end: formatClock(visit.arrivalEnd, i18n.language) })}</p>
      )}
      {visit.status === "scheduled" && visit.customerPrep && (
        <p>
          <span className="font-semibold">{t("visits.beforeHeading")}: </span>
          {visit.customerPrep}
        </p>
      )}
      {visit.workDone && (
        <p>
          <span className="font-semibold">{t("visits.workDone")}: </span>
          {visit.workDone}
        </p>
      )}
    </div>
  );
}
