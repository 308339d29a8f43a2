import { useTranslation } from "react-i18next";
import { Link } from "react-router-dom";
import type { PlanHeader } from "#shared/schemas/plans";
import { Notice } from "#shared/ui/index";
import { useUnread } from "../../../common/api/get-unread.ts";
import { choosePlan } from "../../../common/hooks/use-selected-plan.ts";

/**
 * "Your company wrote back": the answer the Ask screen promised, on the first screen the
 * homeowner opens. Points at the shown plan's conversation first; with several lawns, at the
 * first other one with news, and says which lawn. Nothing is shown while loading or on error:
 * the Messages tab still leads to the thread.
 */
export function UnreadNotice({ plan, plans, company }: { plan: PlanHeader; plans: readonly PlanHeader[]; company: string }) {
  const { t } = useTranslation();
  const { data } = useUnread();
  const news = data?.plans.find((p) => p.planId === plan.id) ?? data?.plans[0];
  if (!news) return null;
  const other = news.planId === plan.id ? undefined : plans.find((p) => p.id === news.planId);
  return (
    <Notice tone="success" className="mb-4" title={t("today.unread.title", { company })}>
      {other && <p>{t("today.unread.otherPlan", { street: other.street })}</p>}
      <Link to="/messages" onClick={() => choosePlan(news.planId)} className="inline-flex min-h-11 items-center font-semibold">
        {t("today.unread.link", { count: news.unread })}
      </Link>
    </Notice>
  );
}
