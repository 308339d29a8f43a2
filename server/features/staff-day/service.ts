import { addDays } from "#shared/engine/dates";
import type { StaffDayQuery, StaffDayResponse } from "#shared/schemas/staff-day";
import type { SessionUser } from "../../auth/session-user.ts";
import type { Db } from "../../db.ts";
import { HttpError } from "../../http/errors.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { activeStaff, companyZone, dayQuestions, dayVisits, unassignedQuestionCount } from "./repo.ts";

/**
 * The staff home's day at `now`, on the company's calendar. A technician always gets their own
 * day; a manager gets the company's, or one staff member's when they pick one.
 */
export async function staffDay(db: Db, user: SessionUser, query: StaffDayQuery, now: Date = new Date()): Promise<StaffDayResponse> {
  const staff = await activeStaff(db, user.companyId);
  let person: { id: number; name: string } | null = null;
  if (user.role === "technician") {
    if (query.technicianId !== undefined && query.technicianId !== user.id) {
      throw new HttpError(403, "forbidden", "Technicians see their own day only.");
    }
    person = { id: user.id, name: user.name };
  } else if (query.technicianId !== undefined) {
    const picked = staff.find((s) => s.id === query.technicianId);
    if (!picked) {
      throw new HttpError(400, "invalid_input", "Some of the information is not valid.", { technicianId: "Choose an active staff member of your company" });
    }
    person = picked;
  }

  const today = localDateAt(await companyZone(db, user.companyId), now);
  const tomorrow = addDays(today, 1);
  const [visits, questions, unassignedQuestions] = await Promise.all([
    dayVisits(db, user.companyId, person?.id ?? null, today, tomorrow),
    dayQuestions(db, user.companyId, person?.id ?? null, now),
    unassignedQuestionCount(db, user.companyId),
  ]);
  return {
    today,
    tomorrow,
    scope: person ? { kind: "technician", technicianId: person.id, name: person.name } : { kind: "company" },
    visitsToday: visits.filter((v) => v.date === today),
    visitsTomorrow: visits.filter((v) => v.date === tomorrow),
    overdueVisits: visits.filter((v) => v.overdue),
    questions,
    unassignedQuestions,
    technicians: user.role === "manager" ? staff.map(({ id, name }) => ({ id, name })) : [],
  };
}
