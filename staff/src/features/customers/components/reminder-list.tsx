import type { CustomerReminder } from "#shared/schemas/customers";
import { formatCalendarDay } from "#shared/ui/index";

type State = CustomerReminder["state"];

/** Delivery state in words, in a colour of our theme: pine went out, ink-soft waiting, rust didn't. */
const stateLabels: Record<State, { label: string; className: string }> = {
  delivered: { label: "Delivered", className: "bg-pine-100 text-pine-900" },
  sent: { label: "Sent", className: "bg-pine-100 text-pine-900" },
  scheduled: { label: "Scheduled", className: "bg-canvas text-ink-soft ring-1 ring-line" },
  sending: { label: "Sending", className: "bg-canvas text-ink-soft ring-1 ring-line" },
  failed: { label: "Failed", className: "bg-rust-50 text-rust-700" },
  cancelled: { label: "Cancelled", className: "bg-rust-50 text-rust-700" },
  skipped_opted_out: { label: "Not sent (opted out)", className: "bg-rust-50 text-rust-700" },
};
const kindLabels: Record<CustomerReminder["kind"], string> = {
  daily_summary: "Daily summary",
  watering_nudge: "Watering nudge",
  conversation_update: "Answer notice",
  visit_update: "Visit notice",
  welcome: "Welcome message",
};
const channelLabels: Record<CustomerReminder["channel"], string> = { sms: "Text", email: "E-mail" };
const stamp = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });

function StateBadge({ state }: { state: State }) {
  const { label, className } = stateLabels[state];
  return <span className={`inline-block rounded-md px-2 text-sm font-semibold whitespace-nowrap ${className}`}>{label}</span>;
}

/** "6:00 am" on the lawn's clock. */
function clock(hhmm: string): string {
  const [h, m] = hhmm.split(":").map(Number) as [number, number];
  return `${h % 12 === 0 ? 12 : h % 12}:${String(m).padStart(2, "0")} ${h < 12 ? "am" : "pm"}`;
}

/** When it really goes out (the ledger's due time on the lawn's clock), not the time the plan asked for. */
const when = (r: CustomerReminder) => `${formatCalendarDay(r.sendDate, { withYear: true })} at ${clock(r.sendTime)}`;

/** Why the time differs from what the plan asked for. */
function HeldNote({ reminder: r }: { reminder: CustomerReminder }) {
  if (!r.heldForQuietHours) return null;
  const asked = r.localDate === r.sendDate ? clock(r.localTime) : `${formatCalendarDay(r.localDate)} ${clock(r.localTime)}`;
  return <span className="block text-base text-ink-soft">Asked for {asked}, held for quiet hours</span>;
}
const attemptsText = (n: number) => (n === 1 ? "1 attempt" : `${n} attempts`);
const sentText = (r: CustomerReminder) => (r.sentAt ? stamp.format(new Date(r.sentAt)) : "—");

/** The customer's most recent reminders and how each delivery went: a table on desktops, a list on phones. */
export function ReminderList({ reminders }: { reminders: CustomerReminder[] }) {
  return (
    <>
      <div className="hidden overflow-x-auto rounded-xl border border-line bg-surface md:block">
        <table className="w-full border-collapse text-left">
          <caption className="sr-only">Reminders, most recent first</caption>
          <thead className="border-b-2 border-line bg-canvas">
            <tr>
              {["Sends", "Reminder", "Channel", "State", "Attempts", "Sent", "Last error"].map((h) => (
                <th key={h} scope="col" className="px-3 py-2 font-semibold">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {reminders.map((r) => (
              <tr key={r.id} className="border-b border-line last:border-0">
                <td className="px-3 py-3 align-top">
                  {when(r)}
                  <HeldNote reminder={r} />
                </td>
                <td className="px-3 py-3 align-top">{kindLabels[r.kind]}</td>
                <td className="px-3 py-3 align-top">{channelLabels[r.channel]}</td>
                <td className="px-3 py-3 align-top">
                  <StateBadge state={r.state} />
                </td>
                <td className="px-3 py-3 align-top">{r.attempts}</td>
                <td className="px-3 py-3 align-top">{sentText(r)}</td>
                <td className="px-3 py-3 align-top text-base [overflow-wrap:anywhere]">{r.lastError ?? "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <ul className="flex flex-col gap-3 md:hidden">
        {reminders.map((r) => (
          <li key={r.id} className="flex flex-col gap-1 rounded-xl border border-line bg-surface p-4">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <p className="font-semibold">
                {kindLabels[r.kind]} by {channelLabels[r.channel].toLowerCase()}
              </p>
              <StateBadge state={r.state} />
            </div>
            <p>
              {when(r)}
              <HeldNote reminder={r} />
            </p>
            <p className="text-base text-ink-soft">
              {attemptsText(r.attempts)}
              {r.sentAt && ` · sent ${sentText(r)}`}
            </p>
            {r.lastError && <p className="text-base text-rust-700 [overflow-wrap:anywhere]">{r.lastError}</p>}
          </li>
        ))}
      </ul>
    </>
  );
}
