import { useEffect, useRef, useState } from "react";
import { useTranslation } from "react-i18next";
import { Link, useLocation, useSearchParams } from "react-router-dom";
import type { PhotoRef, ThreadResponse } from "#shared/schemas/questions";
import { EmptyState, ErrorState, Notice, Page, buttonClasses } from "#shared/ui/index";
import { useQueryClient } from "@tanstack/react-query";
import { useThread } from "../../common/api/get-thread.ts";
import { useUnread } from "../../common/api/get-unread.ts";
import { portalKeys } from "../../common/api/query-keys.ts";
import { OfflineNotice } from "../../common/components/offline-notice.tsx";
import { PlanSwitcher } from "../../common/components/plan-switcher.tsx";
import { QueryFallback } from "../../common/components/query-fallback.tsx";
import { choosePlan, useSelectedPlan } from "../../common/hooks/use-selected-plan.ts";
import { isNotFound } from "../../common/lib/use-error-text.ts";
import { MessageItem } from "./components/message-item.tsx";
import { PhotoViewer } from "./components/photo-viewer.tsx";

/** The conversation of one care plan: questions, answers and photo requests, newest at the bottom. */
export function MessagesRoute() {
  const { t } = useTranslation();
  const location = useLocation();
  const justSent = (location.state as { sent?: boolean } | null)?.sent === true;
  // An answer notice links to /messages?plan=<id>: that plan's conversation wins over the one remembered here.
  const [searchParams, setSearchParams] = useSearchParams();
  const linkedPlan = Number(searchParams.get("plan"));
  const { plansQuery, plans, selected } = useSelectedPlan(Number.isInteger(linkedPlan) && linkedPlan > 0 ? linkedPlan : undefined);
  const switchPlan = (planId: number) => {
    choosePlan(planId);
    if (searchParams.has("plan")) setSearchParams({}, { replace: true });
  };

  return (
    <Page
      title={t("messages.title")}
      intro={t("messages.intro")}
      actions={
        selected && (
          <Link to="/ask" className={buttonClasses("secondary")}>
            {t("messages.askLink")}
          </Link>
        )
      }
    >
      {justSent && (
        <Notice tone="success" className="mb-4">
          {t("messages.sent")}
        </Notice>
      )}
      {!plansQuery.data ? (
        <QueryFallback query={plansQuery} loadingLabel={t("messages.loading")} errorTitle={t("messages.loadError")} />
      ) : !selected ? (
        <EmptyState title={t("messages.noPlan")} />
      ) : (
        <>
          <PlanSwitcher plans={plans} selectedId={selected.id} onChange={switchPlan} />
          <PlanThread planId={selected.id} />
        </>
      )}
    </Page>
  );
}

function PlanThread({ planId }: { planId: number }) {
  const { t } = useTranslation();
  const threadQuery = useThread(planId);
  useFetchNewAnswers(planId);
  const thread = useNewMarksKept(threadQuery.data);
  if (!thread) {
    if (isNotFound(threadQuery.error)) {
      return <ErrorState title={t("messages.loadError")} error={threadQuery.error} message={t("messages.notAvailable")} />;
    }
    return <QueryFallback query={threadQuery} loadingLabel={t("messages.loading")} errorTitle={t("messages.loadError")} />;
  }
  return (
    <>
      <OfflineNotice query={threadQuery} />
      <Thread thread={thread} />
    </>
  );
}

/**
 * The count says there is news this thread hasn't shown yet (it came in while Messages was
 * open, or the copy in memory is from a minute ago): fetch the thread, which also marks it read.
 */
function useFetchNewAnswers(planId: number) {
  const queryClient = useQueryClient();
  const { data, dataUpdatedAt: countedAt } = useUnread();
  const unread = data?.plans.find((p) => p.planId === planId)?.unread ?? 0;
  useEffect(() => {
    // A count older than the thread on screen, or a thread fetch already on its way, has nothing to
    // add; fetching again then would only replace the answer that shows what is new with one that doesn't.
    const thread = queryClient.getQueryState(portalKeys.thread(planId));
    if (unread === 0 || thread?.fetchStatus === "fetching" || (thread?.dataUpdatedAt ?? 0) > countedAt) return;
    void queryClient.invalidateQueries({ queryKey: portalKeys.thread(planId) }, { cancelRefetch: false });
  }, [queryClient, planId, unread, countedAt]);
}

/**
 * Every fetch marks the thread read, so a refetch (the minute's poll, new answers, coming back to
 * the app) answers "not new" for what this visit showed as new. Keep those marks while the page is
 * open: the homeowner should not see "New" vanish before they have read it.
 */
function useNewMarksKept(thread: ThreadResponse | undefined): ThreadResponse | undefined {
  const [marked, setMarked] = useState<ReadonlySet<number>>(() => new Set(thread?.messages.filter((m) => m.unread).map((m) => m.id)));
  const [seen, setSeen] = useState(thread);
  if (thread !== seen) {
    // React's pattern for state derived from a changing prop: adjust it while rendering.
    setSeen(thread);
    const fresh = thread?.messages.filter((m) => m.unread && !marked.has(m.id)) ?? [];
    if (fresh.length > 0) setMarked(new Set([...marked, ...fresh.map((m) => m.id)]));
  }
  if (!thread) return thread;
  return { ...thread, messages: thread.messages.map((m) => (!m.unread && marked.has(m.id) ? { ...m, unread: true } : m)) };
}

function Thread({ thread }: { thread: ThreadResponse }) {
  const { t } = useTranslation();
  const [viewing, setViewing] = useState<{ photo: PhotoRef; alt: string } | null>(null);
  const endRef = useRef<HTMLDivElement>(null);
  const count = thread.messages.length;

  // Newest is at the bottom: start there, and follow new messages as they arrive.
  useEffect(() => {
    if (count > 0) endRef.current?.scrollIntoView({ block: "end" });
  }, [count]);

  if (count === 0) {
    return (
      <EmptyState title={t("messages.empty.title")}>
        <p>{t("messages.empty.body")}</p>
        <Link to="/ask" className={buttonClasses("primary", "mt-4")}>
          {t("messages.askLink")}
        </Link>
      </EmptyState>
    );
  }

  return (
    <>
      <ol className="flex flex-col gap-4">
        {thread.messages.map((message) => (
          <li key={message.id} className="flex">
            <MessageItem message={message} onOpenPhoto={(photo, alt) => setViewing({ photo, alt })} />
          </li>
        ))}
      </ol>
      <div ref={endRef} className="mt-6">
        <Link to="/ask" className={buttonClasses("primary", "w-full sm:w-auto")}>
          {t("messages.askLink")}
        </Link>
      </div>
      <PhotoViewer photo={viewing?.photo ?? null} alt={viewing?.alt ?? ""} onClose={() => setViewing(null)} />
    </>
  );
}
