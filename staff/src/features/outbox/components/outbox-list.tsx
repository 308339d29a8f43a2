import type { OutboxMessage } from "#shared/schemas/outbox";
import { EmptyState } from "#shared/ui/index";
import { OutboxMessageCard } from "./outbox-message.tsx";

export function OutboxList({ messages }: { messages: OutboxMessage[] }) {
  if (messages.length === 0) {
    return (
      <EmptyState title="No messages yet">
        <p>When Sproutline sends a text message or an e-mail, the local fakes catch it and it shows up here.</p>
      </EmptyState>
    );
  }
  return (
    <ol className="flex flex-col gap-4" aria-label="Messages, newest first">
      {messages.map((message) => (
        <li key={message.id}>
          <OutboxMessageCard message={message} />
        </li>
      ))}
    </ol>
  );
}
