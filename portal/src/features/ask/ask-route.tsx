import { useTranslation } from "react-i18next";
import { useSearchParams } from "react-router-dom";
import { EmptyState, Page } from "#shared/ui/index";
import { PlanSwitcher } from "../../common/components/plan-switcher.tsx";
import { QueryFallback } from "../../common/components/query-fallback.tsx";
import { choosePlan, useSelectedPlan } from "../../common/hooks/use-selected-plan.ts";
import { QuestionForm } from "./components/question-form.tsx";

/** "Is this normal?" — a question with photos to the lawn-care team. */
export function AskRoute() {
  const { t } = useTranslation();
  const [searchParams] = useSearchParams();
  const { plansQuery, plans, selected } = useSelectedPlan();
  // Opened from a check-in photo request: start the text for them.
  const initialText = searchParams.has("checkin") ? t("ask.checkInText") : "";

  return (
    <Page title={t("ask.title")} intro={t("ask.intro")}>
      {!plansQuery.data ? (
        <QueryFallback query={plansQuery} loadingLabel={t("common.loading")} errorTitle={t("plan.loadError")} />
      ) : !selected ? (
        <EmptyState title={t("ask.noPlan")} />
      ) : (
        <>
          <PlanSwitcher plans={plans} selectedId={selected.id} onChange={choosePlan} />
          <QuestionForm key={selected.id} planId={selected.id} initialText={initialText} />
        </>
      )}
    </Page>
  );
}
