import { useTranslation } from "react-i18next";
import { isApiRequestError } from "#shared/ui/index";

/**
 * The words for an API error in the reader's language. Messages the client makes up itself
 * (network, unreadable answers, crashes) are translated here; the server's own messages
 * are specific to the case and stay as sent (in English for now).
 */
export function useErrorText(): (error: unknown) => string {
  const { t } = useTranslation();
  return (error) => {
    if (!isApiRequestError(error)) return t("errors.unexpected");
    if (error.code === "network_error") return t("errors.network");
    if (error.code === "bad_response") return t("errors.badResponse");
    if (error.status >= 500) return t("errors.server");
    if (error.code.startsWith("http_")) return t("errors.failed", { status: error.status });
    return error.message;
  };
}

export function isNetworkError(error: unknown): boolean {
  return isApiRequestError(error) && error.code === "network_error";
}

export function isNotFound(error: unknown): boolean {
  return isApiRequestError(error) && error.status === 404;
}
