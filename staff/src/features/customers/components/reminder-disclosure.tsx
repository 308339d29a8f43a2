import { CUSTOMER_REMINDERS_LIMIT, type CustomerReminder } from "#shared/schemas/customers";
import { ReminderList } from "./reminder-list.tsx";

/**
 * Reminders matter when something went wrong, not on every visit to the page: closed by default
 * behind a count, with failures called out so they are not missed while closed.
 */
export function ReminderDisclosure({ reminders }: { reminders: CustomerReminder[] }) {
  const failed = reminders.filter((r) => r.state === "failed").length;
  return (
    <section className="flex flex-col gap-3">
      <details className="group rounded-xl border border-line bg-surface">
        <summary className="flex min-h-12 cursor-pointer flex-wrap items-baseline gap-x-3 px-4 py-3 text-2xl text-pine-900 focus-visible:outline-3 focus-visible:outline-focus">
          <h2 className="inline text-2xl">Reminders</h2>
          <span className="font-sans text-lg font-normal text-ink-soft">({reminders.length})</span>
          {failed > 0 && <span className="font-sans text-base font-semibold text-rust-700">{failed} failed</span>}
        </summary>
        <div className="flex flex-col gap-3 border-t border-line p-4">
          {reminders.length === 0 ? (
            <p className="text-ink-soft">No reminders scheduled or sent yet.</p>
          ) : (
            <>
              <p className="text-base text-ink-soft">
                The most recent {CUSTOMER_REMINDERS_LIMIT} at most, latest first. Times are the lawn's local time, when each is really sent.
              </p>
              <ReminderList reminders={reminders} />
            </>
          )}
        </div>
      </details>
    </section>
  );
}
