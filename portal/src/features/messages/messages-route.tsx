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
  if (!threadQuery.data) {
    if (isNotFound(threadQuery.error)) {
      return <ErrorState title={t("messages.loadError")} error={threadQuery.error} message={t("messages.notAvailable")} />;
    }
    return <QueryFallback query={threadQuery} loadingLabel={t("messages.loading")} errorTitle={t("messages.loadError")} />;
  }
  return (
    <>
      <OfflineNotice query={threadQuery} />
      <Thread thread={threadQuery.data} />
    </>
  );
}

/**
 * The count says there is news this thread hasn't shown yet (it came in while Messages was
 * open, or the copy in memory is from a minute ago): fetch the thread, which also marks it read.
 */
function useFetchNewAnswers(planId: number) {
  const queryClient = useQueryClient();
  const { data } = useUnread();
  const unread = data?.plans.find((p) => p.planId === planId)?.unread ?? 0;
  useEffect(() => {
    if (unread > 0) void queryClient.invalidateQueries({ queryKey: portalKeys.thread(planId) });
  }, [queryClient, planId, unread]);
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
