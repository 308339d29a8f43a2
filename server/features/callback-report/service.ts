import { addDays } from "#shared/engine/index";
import type { CallbackReport, CallbackReportQuery } from "#shared/schemas/callback-report";
import type { Db } from "../../db.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { buildCallbackReport } from "./arithmetic.ts";
import * as repo from "./repo.ts";

/** Without a range: the last twelve months up to today at the company. */
export function resolveRange(query: CallbackReportQuery, today: string): repo.Range {
  const to = query.to ?? today;
  const from = query.from ?? addDays(to, -364);
  return { from, to };
}

export async function callbackReport(db: Db, companyId: number, query: CallbackReportQuery): Promise<CallbackReport> {
  const company = await repo.companyFacts(db, companyId);
  const range = resolveRange(query, localDateAt(company.timeZone));
  const [visits, callbacks, answerWaits, plans] = await Promise.all([
    repo.seedingVisits(db, companyId, range),
    repo.callbacksOfRange(db, companyId, range),
    repo.answerWaits(db, companyId, company.timeZone, range),
    repo.planSteps(db, companyId, range),
  ]);
  return buildCallbackReport({ ...range, labourRatePerHour: company.labourRatePerHour, visits, callbacks, answerWaits, plans });
}
