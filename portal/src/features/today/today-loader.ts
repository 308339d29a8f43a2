import type { QueryClient } from "@tanstack/react-query";
import { myPlansQueryOptions } from "../../common/api/get-my-plans.ts";
import { selectPlan } from "../../common/hooks/use-selected-plan.ts";
import { todayQueryOptions } from "./api/get-today.ts";

/**
 * Starts today's steps as soon as the plan list is known, without waiting for the screen's
 * code or for React: the screen then finds the request already on its way. Never blocks the
 * navigation (offline, a fetch would wait for the connection) and leaves errors to the screen.
 */
export function todayLoader(queryClient: QueryClient) {
  return () => {
    queryClient
      .ensureQueryData(myPlansQueryOptions())
      .then((plans) => {
        const plan = selectPlan(plans);
        if (plan) return queryClient.prefetchQuery(todayQueryOptions(plan.id));
      })
      .catch(() => undefined);
    return null;
  };
}
