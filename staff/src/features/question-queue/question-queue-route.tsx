import { Suspense, lazy } from "react";
import { Link, useSearchParams } from "react-router-dom";
import { EmptyState, ErrorState, LoadingState, Page, useSignedInUser } from "#shared/ui/index";
import { useOpenQuestions } from "../../common/api/open-questions.ts";
import { QueueCards } from "./components/queue-cards.tsx";
import { QueueFilters } from "./components/queue-filters.tsx";
import { ANSWERED_DAY_CHOICES, RecentlyAnswered } from "./components/recently-answered.tsx";
import { QUEUE_FILTER_LABELS, buildRows, countByFilter, countByService, filterRows, isQueueFilter, type QueueFilter } from "./lib/queue-rows.ts";
import { useNow } from "./lib/use-now.ts";
import { useWideScreen } from "./lib/use-wide-screen.ts";

// The sortable table (and its table library) is only fetched on screens wide enough to show it:
// on a technician's phone the queue is a list of cards.
const QueueTable = lazy(() => import("./components/queue-table.tsx").then((m) => ({ default: m.QueueTable })));

const viewLinkClass =
  "inline-flex min-h-11 items-center rounded-lg border-2 border-pine-700 px-4 font-semibold text-pine-700 no-underline hover:bg-pine-50 aria-[current=page]:bg-pine-700 aria-[current=page]:text-white";

/** Open questions, or those answered lately; the choice lives in the address so Back works. */
function ViewSwitch({ answered }: { answered: boolean }) {
  return (
    <nav aria-label="Questions" className="mb-5 flex flex-wrap gap-2">
      <Link to="/questions" className={viewLinkClass} aria-current={answered ? undefined : "page"}>
        Open
      </Link>
      <Link to="/questions?view=answered" className={viewLinkClass} aria-current={answered ? "page" : undefined}>
        Recently answered
      </Link>
    </nav>
  );
}

export function QuestionQueueRoute() {
  const [params, setParams] = useSearchParams();
  if (params.get("view") !== "answered") return <OpenQueue />;
  const asked = Number(params.get("days"));
  const days = (ANSWERED_DAY_CHOICES as readonly number[]).includes(asked) ? asked : 7;
  return (
    <Page title="Recently answered" heading="Question queue" width="wide" intro="Questions the team answered lately, the newest answer first, with who answered.">
      <ViewSwitch answered />
      <RecentlyAnswered days={days} onDaysChange={(d) => setParams({ view: "answered", days: String(d) }, { replace: true })} />
    </Page>
  );
}

/** The question queue: homeowners' open questions, unanswered ones first, oldest waiting at the top. */
function OpenQueue() {
  const user = useSignedInUser();
  const now = useNow();
  const questions = useOpenQuestions();
  const wide = useWideScreen();

  const [params, setParams] = useSearchParams();
  const filterParam = params.get("show");
  const filter: QueueFilter = isQueueFilter(filterParam) ? filterParam : "all";
  const service = params.get("service") || null;
  const setParam = (key: string, value: string | null) =>
    setParams(
      (current) => {
        const next = new URLSearchParams(current);
        if (value) next.set(key, value);
        else next.delete(key);
        return next;
      },
      { replace: true },
    );

  const rows = buildRows(questions.data ?? []);
  const shown = filterRows(rows, filter, service, user.id);

  return (
    <Page title="Question queue" width="wide" intro="Homeowners' open questions: those waiting for an answer first, oldest at the top. Answer them, or book a follow-up visit.">
      <ViewSwitch answered={false} />
      {questions.isPending && <LoadingState label="Loading questions…" />}
      {questions.isError && (
        <ErrorState title="The question queue didn't load" error={questions.error} onRetry={() => void questions.refetch()} retrying={questions.isRefetching} />
      )}
      {questions.data && (
        <div className="flex flex-col gap-5">
          <QueueFilters
            filter={filter}
            service={service}
            filterCounts={countByFilter(rows, service, user.id)}
            serviceCounts={countByService(rows, filter, user.id)}
            onFilterChange={(f) => setParam("show", f === "all" ? null : f)}
            onServiceChange={(s) => setParam("service", s)}
          />
          <p role="status" className="text-ink-soft">
            {shown.length === rows.length ? `${rows.length} open ${rows.length === 1 ? "question" : "questions"}` : `Showing ${shown.length} of ${rows.length} open questions`}
          </p>
          {rows.length === 0 ? (
            <EmptyState title="No open questions">
              <p>Every homeowner's question has an answer. New ones show up here by themselves.</p>
            </EmptyState>
          ) : shown.length === 0 ? (
            <EmptyState title={`No questions under “${QUEUE_FILTER_LABELS[filter]}”`}>
              <p>Try another filter or any service type.</p>
            </EmptyState>
          ) : (
            wide ? (
              <Suspense fallback={<LoadingState label="Loading questions…" />}>
                <QueueTable rows={shown} now={now} />
              </Suspense>
            ) : (
              <QueueCards rows={shown} now={now} />
            )
          )}
        </div>
      )}
    </Page>
  );
}
