import type { UseQueryResult } from "@tanstack/react-query";
import { useTranslation } from "react-i18next";
import { EmptyState, ErrorState, LoadingState } from "#shared/ui/index";
import { useErrorText } from "../lib/use-error-text.ts";

export interface QueryFallbackProps {
  query: Pick<UseQueryResult, "isPending" | "isError" | "error" | "fetchStatus" | "refetch" | "isFetching">;
  loadingLabel: string;
  errorTitle: string;
}

/**
 * What to show while a query has no data: loading, failed, or offline with nothing saved.
 * Render it only when `query.data` is missing.
 */
export function QueryFallback({ query, loadingLabel, errorTitle }: QueryFallbackProps) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  // TanStack pauses queries while offline instead of failing them.
  if (query.isPending && query.fetchStatus === "paused") {
    return (
      <EmptyState title={t("offline.nothingSavedTitle")}>
        <p>{t("offline.nothingSavedBody")}</p>
      </EmptyState>
    );
  }
  if (query.isError) {
    return (
      <ErrorState
        title={errorTitle}
        error={query.error}
        message={errorText(query.error)}
        onRetry={() => void query.refetch()}
        retrying={query.isFetching}
        retryLabel={t("common.tryAgain")}
        retryingLabel={t("common.tryingAgain")}
      />
    );
  }
  return <LoadingState label={loadingLabel} />;
}
