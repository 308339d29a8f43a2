import type { AppDeps } from "./app.ts";
import type { RouteSpec } from "./http/route.ts";
import { authRoutes } from "./features/auth/routes.ts";
import { healthRoutes } from "./features/health/routes.ts";
import { devOutboxRoutes } from "./features/dev-outbox/routes.ts";
import { propertyRoutes } from "./features/properties/routes.ts";
import { companyRoutes } from "./features/company/routes.ts";
import { planRoutes } from "./features/plans/routes.ts";
import { visitRoutes } from "./features/visits/routes.ts";
import { reminderPlanHook } from "./features/reminders/reconcile.ts";
import { reminderRoutes } from "./features/reminders/routes.ts";
import { preferencesRoutes } from "./features/preferences/routes.ts";
import { smsWebhookRoutes } from "./features/sms-webhooks/routes.ts";
import { auditRoutes } from "./features/audit/routes.ts";
import { followUpRoutes } from "./features/follow-ups/routes.ts";
import { callbackReportRoutes } from "./features/callback-report/routes.ts";
import { teamRoutes } from "./features/team/routes.ts";
import { savedReplyRoutes } from "./features/saved-replies/routes.ts";
import { customerRoutes } from "./features/customers/routes.ts";
import { visitImportRoutes } from "./features/visit-import/routes.ts";
import { questionRoutes } from "./features/questions/routes.ts";
import { photoRoutes } from "./features/photos/routes.ts";
import { calendarRoutes } from "./features/calendar/routes.ts";
import { programRoutes } from "./features/programs/routes.ts";
import { placeRuleRoutes } from "./features/place-rules/routes.ts";
import { staffDayRoutes } from "./features/staff-day/routes.ts";
import { homeownerViewRoutes } from "./features/homeowner-view/routes.ts";
import { unmatchedInboundRoutes } from "./features/unmatched-inbound/routes.ts";
import { unreadRoutes } from "./features/unread/routes.ts";

/**
 * The server's whole API route table. The authorisation matrix test reads it, so a
 * route added here without an expectation there fails that test.
 */
export function collectRoutes(deps: AppDeps): RouteSpec[] {
  return [
    ...healthRoutes(deps.db),
    ...companyRoutes(deps),
    ...authRoutes(deps),
    ...propertyRoutes(deps.db),
    ...planRoutes(deps, reminderPlanHook),
    ...visitRoutes(deps, reminderPlanHook),
    ...questionRoutes(deps),
    ...unreadRoutes(deps.db),
    ...photoRoutes(deps),
    ...calendarRoutes(deps),
    ...programRoutes(deps.db),
    ...placeRuleRoutes(deps.db),
    ...reminderRoutes(deps),
    ...preferencesRoutes(deps),
    ...smsWebhookRoutes(deps),
    ...unmatchedInboundRoutes(deps.db),
    ...auditRoutes(deps.db),
    ...followUpRoutes(deps.db),
    ...callbackReportRoutes(deps.db),
    ...teamRoutes(deps),
    ...savedReplyRoutes(deps.db),
    ...customerRoutes(deps.db),
    ...staffDayRoutes(deps.db),
    ...homeownerViewRoutes(deps.db),
    ...visitImportRoutes(deps.db, reminderPlanHook),
    ...devOutboxRoutes(deps.config),
  ];
}
