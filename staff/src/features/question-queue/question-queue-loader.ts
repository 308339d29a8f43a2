import type { QueryClient } from "@tanstack/react-query";
import { openQuestionsQueryOptions } from "../../common/api/open-questions.ts";

/**
 * Starts reading the queue together with the sign-in check, while the screen's code is still on
 * its way, instead of after both. Never blocks the navigation and leaves errors to the screen
 * (signed out, the request answers 401 and the sign-in check sends the person on as before).
 */
export function questionQueueLoader(queryClient: QueryClient) {
  return () => {
    void queryClient.prefetchQuery(openQuestionsQueryOptions());
    return null;
  };
}
