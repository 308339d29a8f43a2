import { useId } from "react";
import { useParams } from "react-router-dom";
import { ErrorState, LoadingState, NotFoundPage, Page, isApiRequestError } from "#shared/ui/index";
import { useHomeownerPlan } from "./api/get-homeowner-plan.ts";
import { useHomeownerToday } from "./api/get-homeowner-today.ts";
import { useStepChanges } from "./api/get-step-changes.ts";
import { ReadOnlyBanner } from "./components/read-only-banner.tsx";
import { TodayView } from "./components/today-view.tsx";
import { WholePlanView } from "./components/whole-plan-view.tsx";

export function HomeownerViewRoute() {
  const planId = Number(useParams().planId);
  if (!Number.isInteger(planId) || planId <= 0) return <NotFoundPage />;
  return <HomeownerView planId={planId} />;
}

/**
 * The homeowner's Today and whole plan as the portal shows them, for staff answering a call or
 * a question: read only, so there is not a single button here that changes the homeowner's data.
 */
function HomeownerView({ planId }: { planId: number }) {
  const who = useStepChanges(planId);
  const today = useHomeownerToday(planId);
  const plan = useHomeownerPlan(planId);
  const todayHeading = useId();
  const planHeading = useId();

  if (isApiRequestError(who.error) && who.error.status === 404) return <NotFoundPage />;
  if (who.isError) {
    return (
      <Page title="Homeowner's view">
        <ErrorState title="The homeowner's view didn't load" error={who.error} onRetry={() => void who.refetch()} retrying={who.isRefetching} />
      </Page>
    );
  }
  if (!who.data) {
    return (
      <Page title="Homeowner's view">
        <LoadingState label="Loading the homeowner's view…" />
      </Page>
    );
  }
  const changes = new Map(who.data.stepChanges.map((c) => [c.stepId, c]));
  const name = who.data.homeowner.name;

  return (
    <Page title={`${name}'s plan (read only)`} heading={`${name}'s care plan`}>
      <ReadOnlyBanner homeowner={who.data.homeowner} />
      <nav aria-label="On this page" className="mb-6 flex gap-4">
        <a href="#homeowner-today" className="inline-flex min-h-11 items-center font-semibold">
          Today
        </a>
        <a href="#homeowner-plan" className="inline-flex min-h-11 items-center font-semibold">
          Whole plan
        </a>
      </nav>
      <div className="flex flex-col gap-10">
        <section id="homeowner-today" aria-labelledby={todayHeading} className="flex scroll-mt-28 flex-col gap-3">
          <h2 id={todayHeading} className="text-2xl text-pine-900">
            Today
          </h2>
          {today.isPending && <LoadingState label="Loading today…" />}
          {today.isError && <ErrorState title="Today didn't load" error={today.error} onRetry={() => void today.refetch()} retrying={today.isRefetching} />}
          {today.data && <TodayView today={today.data} changes={changes} />}
        </section>
        <section id="homeowner-plan" aria-labelledby={planHeading} className="flex scroll-mt-28 flex-col gap-3">
          <h2 id={planHeading} className="text-2xl text-pine-900">
            Whole plan
          </h2>
          {plan.isPending && <LoadingState label="Loading the plan…" />}
          {plan.isError && <ErrorState title="The plan didn't load" error={plan.error} onRetry={() => void plan.refetch()} retrying={plan.isRefetching} />}
          {plan.data && <WholePlanView plan={plan.data} changes={changes} today={today.data?.today ?? null} />}
        </section>
      </div>
    </Page>
  );
}
