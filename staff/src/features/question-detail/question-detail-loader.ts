import type { QueryClient } from "@tanstack/react-query";
import type { LoaderFunctionArgs } from "react-router-dom";
import { planQueryOptions } from "../../common/api/get-plan.ts";
import { threadQueryOptions } from "./api/get-thread.ts";

/**
 * Starts the question's conversation and plan together with the sign-in check, while the
 * screen's code is still on its way. Never blocks the navigation; a bad id or an error is the
 * screen's to show.
 */
export function questionDetailLoader(queryClient: QueryClient) {
  return ({ params }: LoaderFunctionArgs) => {
    const planId = Number(params.planId);
    if (Number.isInteger(planId) && planId > 0) {
      void queryClient.prefetchQuery(threadQueryOptions(planId));
      void queryClient.prefetchQuery(planQueryOptions(planId));
    }
    return null;
  };
}
