import { useId } from "react";
import type { OutboxMessage } from "#shared/schemas/outbox";
import { LinkifiedText, safeHttpUrl, splitLinks } from "#shared/ui/index";

const timeFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "medium" });

/** One message as the fake received it. The e-mail's HTML part is never rendered: only text and links. */
export function OutboxMessageCard({ message }: { message: OutboxMessage }) {
  const headingId = useId();
  const inText = new Set(splitLinks(message.text).flatMap((part) => (part.href ? [part.href] : [])));
  // Links found only in the HTML part (the fake extracts them); each address is shown once per message.
  const extraLinks = [...new Set(message.links.map(safeHttpUrl))].filter((href): href is string => href !== null && !inText.has(href));
  const received = new Date(message.receivedAt);

  return (
    <article aria-labelledby={headingId} className="rounded-xl border border-line bg-surface p-4 sm:p-5" data-testid="outbox-message">
      <header className="flex flex-wrap items-center gap-2">
        <span className="rounded-md bg-loam-100 px-2 py-0.5 text-sm font-bold text-loam-700 uppercase">
          {message.channel === "sms" ? "SMS" : "E-mail"}
        </span>
        <StatusBadge status={message.status} />
        <time dateTime={message.receivedAt} className="ml-auto text-sm text-ink-soft">
          {Number.isNaN(received.getTime()) ? message.receivedAt : timeFormat.format(received)}
        </time>
      </header>
      <h2 id={headingId} className="mt-2 text-xl [overflow-wrap:anywhere]">
        {message.subject ?? (message.channel === "sms" ? "Text message" : "(no subject)")}
      </h2>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 text-base">
        <dt className="font-semibold">To</dt>
        <dd className="[overflow-wrap:anywhere]" data-testid="outbox-to">{message.to}</dd>
        <dt className="font-semibold">From</dt>
        <dd className="text-ink-soft [overflow-wrap:anywhere]">{message.from}</dd>
      </dl>
      <LinkifiedText text={message.text} className="mt-3 rounded-lg bg-canvas p-3" />
      {extraLinks.length > 0 && (
        <div className="mt-3">
          <p className="font-semibold">Other links in this message</p>
          <ul className="mt-1 list-disc pl-5">
            {extraLinks.map((href) => (
              <li key={href} className="[overflow-wrap:anywhere]">
                <a href={href}>{href}</a>
              </li>
            ))}
          </ul>
        </div>
      )}
    </article>
  );
}

function StatusBadge({ status }: { status: string }) {
  const failed = /fail|undeliver|reject|bounce|error/i.test(status);
  return (
    <span
      className={`rounded-md px-2 py-0.5 text-sm font-semibold ${failed ? "bg-rust-50 text-rust-700" : "bg-pine-100 text-pine-900"}`}
    >
      {status}
    </span>
  );
}
