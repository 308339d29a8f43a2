import { useTranslation } from "react-i18next";
import { Notice } from "#shared/ui/index";
import { useIsOnline } from "../hooks/use-online.ts";
import { formatMoment } from "../lib/dates.ts";
import { isNetworkError } from "../lib/use-error-text.ts";

export interface OfflineNoticeProps {
  /** The query whose data is on screen. */
  query: {
    /** When the data on screen was fetched. */
    dataUpdatedAt: number;
    /** Set once a refresh has failed for good. */
    error: unknown;
    /** Set from the first failed attempt, while retries still run: the notice needn't wait for them. */
    failureReason: unknown;
  };
}

/** Says plainly that the screen shows a saved copy, and from when, so nobody waters by stale advice unknowingly. */
export function OfflineNotice({ query }: OfflineNoticeProps) {
  const { t, i18n } = useTranslation();
  const online = useIsOnline();
  if (online && !isNetworkError(query.error ?? query.failureReason)) return null;
  return (
    <Notice tone="warning" className="mb-4" title={t("offline.title", { time: formatMoment(query.dataUpdatedAt, i18n.language) })}>
      {t("offline.body")}
    </Notice>
  );
}
