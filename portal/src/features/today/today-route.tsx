import { useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { useTranslation } from "react-i18next";
import type { PlanHeader, TodayResponse } from "#shared/schemas/plans";
import { EmptyState, Notice, Page, firstName, useSignedInUser } from "#shared/ui/index";
import { Link } from "react-router-dom";
import { planQueryOptions } from "../../common/api/get-plan.ts";
import { HoldOffList } from "../../common/components/hold-off-list.tsx";
import { OfflineNotice } from "../../common/components/offline-notice.tsx";
import { PlanSwitcher } from "../../common/components/plan-switcher.tsx";
import { PlanWarnings } from "../../common/components/plan-warnings.tsx";
import { QueryFallback } from "../../common/components/query-fallback.tsx";
import { Section } from "../../common/components/section.tsx";
import { UpcomingVisits } from "../../common/components/upcoming-visits.tsx";
import { choosePlan, useSelectedPlan } from "../../common/hooks/use-selected-plan.ts";
import { daysBetween, formatLongDate, localDateIn } from "../../common/lib/dates.ts";
import { whenSettled } from "../../common/lib/when-idle.ts";
import { useToday } from "./api/get-today.ts";
import { NextMilestone } from "./components/next-milestone.tsx";
import { NoPlanYet } from "./components/no-plan-yet.tsx";
import { SproutsPrompt, sproutsAlreadyReported } from "./components/sprouts-prompt.tsx";
import { StepCard } from "./components/step-card.tsx";
import { UnreadNotice } from "./components/unread-notice.tsx";

/** The home screen: what to do on the lawn today, readable in five seconds. */
export function TodayRoute() {
  const { t } = useTranslation();
  const user = useSignedInUser();
  const { plansQuery, plans, selected } = useSelectedPlan();

  if (!plansQuery.data) {
    return (
      <Page title={t("today.title")}>
        <QueryFallback query={plansQuery} loadingLabel={t("today.loading")} errorTitle={t("today.loadError")} />
      </Page>
    );
  }
  if (!selected) {
    return (
      <Page title={t("today.title")} heading={t("today.hello", { name: firstName(user) })}>
        <NoPlanYet companyName={user.companyName} />
      </Page>
    );
  }
  return <TodayForPlan plan={selected} plans={plans} />;
}

function TodayForPlan({ plan, plans }: { plan: PlanHeader; plans: PlanHeader[] }) {
  const { t, i18n } = useTranslation();
  const user = useSignedInUser();
  const todayQuery = useToday(plan.id);
  const today = todayQuery.data;
  usePrefetchWholePlan(plan.id, Boolean(today));

  return (
    <Page
      title={t("today.title")}
      heading={t("today.hello", { name: firstName(user) })}
      intro={
        <>
          <p className="font-semibold text-ink">{today ? `${formatLongDate(today.today, i18n.language)} · ${plan.street}` : plan.street}</p>
          <p>{t("today.carePlanFrom", { company: user.companyName })}</p>
        </>
      }
    >
      <UnreadNotice plan={plan} plans={plans} company={user.companyName} />
      <PlanSwitcher plans={plans} selectedId={plan.id} onChange={choosePlan} />
      {today ? (
        <>
          <OfflineNotice query={todayQuery} />
          <TodayContent today={today} />
        </>
      ) : (
        <QueryFallback query={todayQuery} loadingLabel={t("today.loading")} errorTitle={t("today.loadError")} />
      )}
    </Page>
  );
}

/**
 * Once today is on screen, fetch the whole plan too, so it can be read later without a signal.
 * It waits until the screen's own requests are done and the phone is idle: it is for later.
 */
function usePrefetchWholePlan(planId: number, ready: boolean) {
  const queryClient = useQueryClient();
  useEffect(() => {
    if (ready) return whenSettled(queryClient, () => void queryClient.prefetchQuery(planQueryOptions(planId)));
  }, [queryClient, planId, ready]);
}

const seedingServices = new Set(["overseeding", "slit_seeding", "new_seeding"]);

function TodayContent({ today }: { today: TodayResponse }) {
  const { t, i18n } = useTranslation();
  const planId = today.plan.id;
  // A saved copy from an earlier day must not pass for today's list.
  const isOldCopy = today.today < localDateIn(today.plan.timeZone);
  // Read once per visit to the screen, so the thank-you stays up after reporting.
  const [askAboutSprouts] = useState(() => !sproutsAlreadyReported(planId));
  const dayOfPlan = daysBetween(today.plan.visitDate, today.today);
  const waitingForSprouts =
    askAboutSprouts &&
    today.plan.services.some((s) => seedingServices.has(s)) &&
    today.steps.some((s) => s.phase === "germination") &&
    dayOfPlan >= 1 &&
    dayOfPlan <= 60;

  return (
    <>
      {isOldCopy && (
        <Notice tone="warning" className="mb-4" title={t("today.oldCopyTitle", { date: formatLongDate(today.today, i18n.language) })}>
          <Link to={`/plan/${planId}`}>{t("today.oldCopyLink")}</Link>
        </Notice>
      )}

      <Section title={t("today.stepsHeading")}>
        {today.steps.length > 0 ? (
          <ul className="space-y-4">
            {today.steps.map((step) => (
              <li key={step.id}>
                <StepCard planId={planId} step={step} cautions={today.cautions} />
              </li>
            ))}
          </ul>
        ) : (
          <EmptyState title={t("today.noSteps.title")}>
            <p>{t("today.noSteps.body")}</p>
          </EmptyState>
        )}
      </Section>

      <UpcomingVisits planId={planId} today={today.today} />

      {waitingForSprouts && (
        <div className="mt-6">
          <SproutsPrompt planId={planId} dayOfPlan={dayOfPlan} />
        </div>
      )}

      {today.nextMilestone && (
        <Section title={t("today.nextHeading")}>
          <NextMilestone today={today.today} milestone={today.nextMilestone} />
        </Section>
      )}

      {today.activeHoldOffs.length > 0 && (
        <Section title={t("today.holdOffsHeading")}>
          <HoldOffList holdOffs={today.activeHoldOffs} cautions={today.cautions} />
        </Section>
      )}

      {today.warnings.length > 0 && (
        <Section title={t("today.warningsHeading")}>
          <PlanWarnings warnings={today.warnings} />
        </Section>
      )}

      <p className="mt-8">
        <Link to={`/plan/${planId}`} className="inline-flex min-h-11 items-center font-semibold">
          {t("today.seeWholePlan")}
        </Link>
      </p>
    </>
  );
}
