import { useState, type FormEvent } from "react";
import { useTranslation } from "react-i18next";
import { WEEKDAYS, type PlanVisit, type Weekday } from "#shared/schemas/follow-ups";
import { Button, CheckboxField, Notice, TextAreaField, useSignedInUser } from "#shared/ui/index";
import { useAskAnotherDay } from "../api/ask-another-day.ts";
import { useConfirmVisit } from "../api/confirm-visit.ts";
import { formatClock, formatLongDate } from "../lib/dates.ts";
import { useErrorText } from "../lib/use-error-text.ts";

/** Date, arrival window, who is coming and why: the facts a homeowner plans their day around. */
export function VisitFacts({ visit }: { visit: PlanVisit }) {
  const { t, i18n } = useTranslation();
  const user = useSignedInUser();
  return (
    <>
      {visit.scheduledFor && <p className="text-xl font-bold text-pine-900">{formatLongDate(visit.scheduledFor, i18n.language)}</p>}
      <p className="font-semibold">
        {visit.arrivalStart && visit.arrivalEnd
          ? t("visits.window", { start: formatClock(visit.arrivalStart, i18n.language), end: formatClock(visit.arrivalEnd, i18n.language) })
          : t("visits.noWindow")}
      </p>
      <p>
        {visit.technicianName
          ? t("visits.whoIsComing", { name: visit.technicianName, company: user.companyName })
          : t("visits.companyIsComing", { company: user.companyName })}
      </p>
      <p>{t("visits.why", { reason: t(`visits.reasons.${visit.reason}`) })}</p>
    </>
  );
}

/** A booked visit with what to do before it, and the homeowner's answer: it works, or another day please. */
function BookedVisitCard({ planId, visit }: { planId: number; visit: PlanVisit }) {
  const { t } = useTranslation();
  return (
    <article className="rounded-xl border-2 border-pine-700 bg-surface p-4" aria-label={t("visits.upcomingHeading")}>
      <div className="space-y-1">
        <VisitFacts visit={visit} />
      </div>
      {visit.customerPrep && (
        <div className="mt-3 rounded-lg bg-straw-50 p-3">
          <p className="font-bold">{t("visits.beforeHeading")}</p>
          <p className="whitespace-pre-line">{visit.customerPrep}</p>
        </div>
      )}
      <VisitAnswer planId={planId} visit={visit} />
    </article>
  );
}

function VisitAnswer({ planId, visit }: { planId: number; visit: PlanVisit }) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const confirm = useConfirmVisit(planId, visit.id);
  const [asking, setAsking] = useState(false);

  if (visit.customerResponse === "confirmed") return <Notice tone="success" className="mt-4">{t("visits.confirmed")}</Notice>;
  if (visit.customerResponse === "another_day") return <Notice className="mt-4">{t("visits.anotherDayAsked")}</Notice>;
  if (asking) return <AnotherDayForm planId={planId} visitId={visit.id} onCancel={() => setAsking(false)} />;
  return (
    <div className="mt-4">
      <div className="flex flex-wrap gap-3">
        <Button onClick={() => confirm.mutate()} disabled={confirm.isPending}>
          {confirm.isPending ? t("visits.sending") : t("visits.confirm")}
        </Button>
        <Button variant="secondary" onClick={() => setAsking(true)} disabled={confirm.isPending}>
          {t("visits.anotherDay")}
        </Button>
      </div>
      {confirm.isError && (
        <Notice tone="danger" className="mt-3" title={t("visits.answerError")}>
          {errorText(confirm.error)}
        </Notice>
      )}
    </div>
  );
}

function AnotherDayForm({ planId, visitId, onCancel }: { planId: number; visitId: number; onCancel: () => void }) {
  const { t } = useTranslation();
  const errorText = useErrorText();
  const ask = useAskAnotherDay(planId, visitId);
  const [days, setDays] = useState<Weekday[]>([]);
  const [note, setNote] = useState("");

  const toggle = (day: Weekday, on: boolean) => setDays((current) => (on ? WEEKDAYS.filter((d) => d === day || current.includes(d)) : current.filter((d) => d !== day)));
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const trimmed = note.trim();
    ask.mutate({ preferredDays: days.length ? days : undefined, note: trimmed || undefined });
  };

  return (
    <form onSubmit={submit} className="mt-4 space-y-3" aria-label={t("visits.anotherDayTitle")}>
      <p className="font-bold">{t("visits.anotherDayTitle")}</p>
      <p>{t("visits.anotherDayIntro")}</p>
      <fieldset>
        <legend className="font-semibold">{t("visits.preferredDays")}</legend>
        <div className="grid grid-cols-2 gap-x-4 sm:grid-cols-4">
          {WEEKDAYS.map((day) => (
            <CheckboxField key={day} label={t(`visits.weekdays.${day}`)} checked={days.includes(day)} onChange={(e) => toggle(day, e.target.checked)} />
          ))}
        </div>
      </fieldset>
      <TextAreaField label={t("visits.note")} value={note} maxLength={1000} onChange={(e) => setNote(e.target.value)} />
      {ask.isError && (
        <Notice tone="danger" title={t("visits.answerError")}>
          {errorText(ask.error)}
        </Notice>
      )}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" disabled={ask.isPending}>
          {ask.isPending ? t("visits.sending") : t("visits.send")}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel} disabled={ask.isPending}>
          {t("visits.cancel")}
        </Button>
      </div>
    </form>
  );
}

/** Visits still to come: booked for today or later. */
export const upcomingVisits = (visits: readonly PlanVisit[], today: string) =>
  visits.filter((v) => v.status === "scheduled" && v.scheduledFor !== null && v.scheduledFor >= today);

export function BookedVisitList({ planId, visits }: { planId: number; visits: readonly PlanVisit[] }) {
  return (
    <ul className="space-y-4">
      {visits.map((visit) => (
        <li key={visit.id}>
          <BookedVisitCard planId={planId} visit={visit} />
        </li>
      ))}
    </ul>
  );
}
