import { useTranslation } from "react-i18next";
import { useNavigate, useParams } from "react-router-dom";
import type { PlanHeader } from "#shared/schemas/plans";
import { Button, EmptyState, ErrorState, Page } from "#shared/ui/index";
import { usePlan } from "../../common/api/get-plan.ts";
import { usePlanVisits } from "../../common/api/get-plan-visits.ts";
import { HoldOffList } from "../../common/components/hold-off-list.tsx";
import { OfflineNotice } from "../../common/components/offline-notice.tsx";
import { PlanSwitcher } from "../../common/components/plan-switcher.tsx";
import { PlanVisits } from "../../common/components/plan-visits.tsx";
import { PlanWarnings } from "../../common/components/plan-warnings.tsx";
import { QueryFallback } from "../../common/components/query-fallback.tsx";
import { Section } from "../../common/components/section.tsx";
import { choosePlan, useSelectedPlan } from "../../common/hooks/use-selected-plan.ts";
import { formatShortDate, localDateIn } from "../../common/lib/dates.ts";
import { formatArea, useUnits } from "../../common/lib/units.ts";
import { PlanTimeline } from "./components/plan-timeline.tsx";
import { PrintedCompany } from "./components/printed-company.tsx";
import "./print.css";

/** The whole care plan; also what gets printed for the fridge. */
export function PlanRoute() {
  const { t } = useTranslation();
  const params = useParams();
  const requestedId = params.planId === undefined ? undefined : Number(params.planId);
  const { plansQuery, plans, selected } = useSelectedPlan(requestedId);

  if (!plansQuery.data) {
    return (
      <Page title={t("plan.title")}>
        <QueryFallback query={plansQuery} loadingLabel={t("plan.loading")} errorTitle={t("plan.loadError")} />
      </Page>
    );
  }
  if (requestedId !== undefined && selected?.id !== requestedId) {
    return (
      <Page title={t("plan.title")}>
        <ErrorState title={t("plan.loadError")} error={null} message={t("plan.notFound")} />
      </Page>
    );
  }
  if (!selected) {
    return (
      <Page title={t("plan.title")}>
        <EmptyState title={t("today.noPlan.title")} />
      </Page>
    );
  }
  return <WholePlan header={selected} plans={plans} />;
}

function WholePlan({ header, plans }: { header: PlanHeader; plans: PlanHeader[] }) {
  const { t, i18n } = useTranslation();
  const navigate = useNavigate();
  const units = useUnits();
  const planQuery = usePlan(header.id);
  const plan = planQuery.data;
  const visits = usePlanVisits(header.id).data;
  const today = localDateIn(header.timeZone);
  const anchorDate = plan?.steps.map((s) => s.date).sort().find((date) => date >= today);
  const areaFt2 = typeof plan?.figures.areaFt2 === "number" ? plan.figures.areaFt2 : undefined;

  return (
    <div className="printable-plan">
      <PrintedCompany />
      <Page
        title={t("plan.title")}
        width="wide"
        intro={
          <>
            <p>{t("plan.intro", { street: header.street, date: formatShortDate(header.visitDate, i18n.language) })}</p>
            <p>{t("plan.progress", header.progress)}</p>
            {areaFt2 !== undefined && <p>{t("plan.lawnArea", { area: formatArea(areaFt2, units, i18n.language) })}</p>}
          </>
        }
        actions={
          <Button variant="secondary" className="print:hidden" onClick={() => window.print()}>
            <PrinterIcon />
            {t("plan.print")}
          </Button>
        }
      >
        <PlanSwitcher
          plans={plans}
          selectedId={header.id}
          onChange={(planId) => {
            choosePlan(planId);
            navigate(`/plan/${planId}`);
          }}
        />
        {plan ? (
          <>
            <OfflineNotice query={planQuery} />
            {anchorDate && (
              <p className="mb-4 print:hidden">
                <a href="#today" className="inline-flex min-h-11 items-center font-semibold">
                  {t("plan.jumpToToday")}
                </a>
              </p>
            )}
            <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_20rem] lg:items-start">
              <div className="lg:order-2 space-y-8">
                <PlanVisits planId={header.id} today={today} />
                {plan.holdOffs.length > 0 && (
                  <Section title={t("plan.holdOffsHeading")}>
                    <HoldOffList holdOffs={plan.holdOffs} cautions={plan.cautions} />
                  </Section>
                )}
                {plan.warnings.length > 0 && (
                  <Section title={t("plan.warningsHeading")}>
                    <PlanWarnings warnings={plan.warnings} />
                  </Section>
                )}
              </div>
              <div className="lg:order-1">
                <PlanTimeline plan={plan} today={today} anchorDate={anchorDate} visits={visits} />
              </div>
            </div>
          </>
        ) : (
          <QueryFallback query={planQuery} loadingLabel={t("plan.loading")} errorTitle={t("plan.loadError")} />
        )}
      </Page>
    </div>
  );
}

function PrinterIcon() {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" focusable="false" className="size-5" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round">
      <path d="M7 9V4h10v5M7 17H4v-8h16v8h-3M7 14h10v6H7z" />
    </svg>
  );
}
