import { useTranslation } from "react-i18next";
import { Link } from "react-router-dom";
import type { TodayResponse } from "#shared/schemas/plans";
import { StepKindIcon } from "../../../common/components/step-kind-icon.tsx";
import { daysBetween, formatDayWithWeekday } from "../../../common/lib/dates.ts";

export interface NextMilestoneProps {
  today: string;
  milestone: NonNullable<TodayResponse["nextMilestone"]>;
}

/** What's coming next (first mowing, a feed, a check-in photo), with how far away it is. */
export function NextMilestone({ today, milestone }: NextMilestoneProps) {
  const { t, i18n } = useTranslation();
  const days = daysBetween(today, milestone.date);
  const when = days === 1 ? t("milestone.tomorrow") : t("milestone.inDays", { count: days });
  return (
    <div className="flex items-start gap-3 rounded-xl border-2 border-line bg-surface p-4">
      <span className="rounded-full bg-loam-100 p-2 text-loam-700">
        <StepKindIcon kind={milestone.kind} className="size-6" />
      </span>
      <div>
        <p className="text-lg font-semibold">{milestone.title}</p>
        <p className="text-ink-soft">
          {when} · {formatDayWithWeekday(milestone.date, i18n.language)}
        </p>
        {milestone.kind === "check_in_photo" && (
          <Link to="/ask?checkin=1" className="mt-2 inline-flex min-h-11 items-center font-semibold">
            {t("milestone.sendPhotoEarly")}
          </Link>
        )}
      </div>
    </div>
  );
}
