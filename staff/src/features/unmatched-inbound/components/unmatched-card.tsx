import { Link } from "react-router-dom";
import type { UnmatchedInbound } from "#shared/schemas/unmatched-inbound";
import { Button, waitingTime } from "#shared/ui/index";

export interface UnmatchedCardProps {
  item: UnmatchedInbound;
  busy: boolean;
  onHandled: (item: UnmatchedInbound) => void;
}

const channelLabel = { sms: "Text", email: "E-mail" } as const;

function receivedLabel(iso: string): string {
  return new Date(iso).toLocaleString("en-US", { month: "short", day: "numeric", hour: "numeric", minute: "2-digit" });
}

/** One text or e-mail: who sent it, what it says, and a way to reach them back. */
export function UnmatchedCard({ item, busy, onHandled }: UnmatchedCardProps) {
  const contactHref = item.channel === "sms" ? `sms:${item.sender}` : `mailto:${item.sender}`;
  return (
    <li className={`flex flex-col gap-2 rounded-xl border border-line p-4 ${item.handledAt ? "bg-canvas" : "bg-surface"}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="min-w-0 font-sans text-lg font-bold">
          <span className="mr-2 rounded-full border border-pine-700 bg-pine-50 px-2.5 py-0.5 text-sm font-semibold text-pine-800">{channelLabel[item.channel]}</span>
          <a className="break-all underline" href={contactHref}>
            {item.sender}
          </a>
        </h3>
        <p className="text-sm text-ink-soft">
          <time dateTime={item.receivedAt}>{receivedLabel(item.receivedAt)}</time> ({waitingTime(item.receivedAt)} ago)
        </p>
      </div>
      {item.customer && (
        <p className="text-ink-soft">
          From customer <Link className="underline" to={`/customers/${item.customer.id}`}>{item.customer.name}</Link> (no active plan to file it on)
        </p>
      )}
      {/* Plain text, never linkified: these senders are strangers. */}
      <p className="whitespace-pre-wrap break-words">{item.body || <em className="text-ink-soft">No words, only attachments</em>}</p>
      {item.mediaCount > 0 && (
        <p className="text-sm text-ink-soft">
          {item.mediaCount} {item.mediaCount === 1 ? "attachment" : "attachments"} not kept (we don't store files from unknown senders).
        </p>
      )}
      <div className="flex flex-wrap items-center gap-3">
        {item.handledAt ? (
          <p className="text-sm font-semibold text-pine-800">
            Handled{item.handledByName ? ` by ${item.handledByName}` : ""} on {receivedLabel(item.handledAt)}
          </p>
        ) : (
          <Button variant="secondary" disabled={busy} onClick={() => onHandled(item)}>
            Mark handled
            <span className="sr-only"> (message from {item.sender})</span>
          </Button>
        )}
      </div>
    </li>
  );
}
