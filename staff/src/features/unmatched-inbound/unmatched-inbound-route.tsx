import { useState } from "react";
import type { UnmatchedInbound } from "#shared/schemas/unmatched-inbound";
import { EmptyState, ErrorState, LoadingState, Notice, Page, errorMessage } from "#shared/ui/index";
import { useUnmatchedInbound } from "./api/get-unmatched-inbound.ts";
import { useMarkHandled } from "./api/mark-handled.ts";
import { UnmatchedCard } from "./components/unmatched-card.tsx";

/** Texts and e-mails we couldn't file on a customer's plan: a manager reaches out, then marks each handled. */
export function UnmatchedInboundRoute() {
  const list = useUnmatchedInbound();
  const handle = useMarkHandled();
  const [message, setMessage] = useState<{ tone: "success" | "danger"; text: string } | null>(null);

  const onHandled = (item: UnmatchedInbound) => {
    setMessage(null);
    handle.mutate(item.id, {
      onSuccess: () => setMessage({ tone: "success", text: `Marked the message from ${item.sender} handled.` }),
      onError: (error) => setMessage({ tone: "danger", text: errorMessage(error) }),
    });
  };

  const items = list.data ?? [];
  const open = items.filter((i) => !i.handledAt);
  const handled = items.filter((i) => i.handledAt);

  return (
    <Page title="Unmatched messages" intro="Texts and e-mails from people we couldn't match to a customer's plan. Each sender got one reply telling them how to reach the office.">
      <div className="flex flex-col gap-6">
        {message && <Notice tone={message.tone}>{message.text}</Notice>}
        {list.isError && <ErrorState title="The messages didn't load" error={list.error} onRetry={() => void list.refetch()} retrying={list.isFetching} />}
        {list.isPending && !list.isError && <LoadingState label="Loading unmatched messages…" />}
        {list.data && open.length === 0 && (
          <EmptyState title="Nothing waiting">Every text and e-mail reached a customer's plan, or was handled.</EmptyState>
        )}
        {open.length > 0 && <ItemList id="unmatched-open" title={`Waiting (${open.length})`} items={open} busy={handle.isPending} onHandled={onHandled} />}
        {handled.length > 0 && <ItemList id="unmatched-handled" title={`Handled in the last 30 days (${handled.length})`} items={handled} busy={handle.isPending} onHandled={onHandled} />}
      </div>
    </Page>
  );
}

function ItemList({ id, title, items, busy, onHandled }: { id: string; title: string; items: UnmatchedInbound[]; busy: boolean; onHandled: (item: UnmatchedInbound) => void }) {
  return (
    <section aria-labelledby={id}>
      <h2 id={id} className="mb-3 text-xl">
        {title}
      </h2>
      <ul className="flex flex-col gap-3">
        {items.map((item) => (
          <UnmatchedCard key={item.id} item={item} busy={busy} onHandled={onHandled} />
        ))}
      </ul>
    </section>
  );
}
