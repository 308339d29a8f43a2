import type { ThreadMessage } from "#shared/schemas/questions";
import { formatStamp, type OpenPhoto } from "../lib/photo-viewing.ts";
import { PhotoButton } from "./photo-button.tsx";

const kindLabels: Record<ThreadMessage["kind"], string> = {
  question: "Question",
  answer: "Answer",
  check_in_request: "Check-in photo request",
  note: "Note",
};

/** Messages around the question, folded away unless wanted. */
export function ConversationMessages({ title, messages, onOpenPhoto, open = false }: { title: string; messages: ThreadMessage[]; onOpenPhoto: OpenPhoto; open?: boolean }) {
  if (messages.length === 0) return null;
  return (
    <details open={open} className="rounded-xl border border-line bg-surface">
      <summary className="flex min-h-11 cursor-pointer items-center px-4 font-semibold text-pine-800">
        {title} ({messages.length})
      </summary>
      <ol className="flex flex-col gap-3 px-4 pb-4">
        {messages.map((message) => (
          <li key={message.id} className={`rounded-lg p-3 ${message.authorRole === "customer" ? "bg-canvas" : "bg-pine-50"}`} data-testid="thread-message">
            <p className="text-base text-ink-soft">
              <strong className="text-ink">{message.authorName}</strong> · {kindLabels[message.kind]} · <time dateTime={message.createdAt}>{formatStamp(message.createdAt)}</time>
            </p>
            <p className="mt-1 whitespace-pre-line [overflow-wrap:anywhere]">{message.text}</p>
            {message.photos.length > 0 && (
              <ul className="mt-2 grid grid-cols-3 gap-2 sm:grid-cols-4" aria-label="Photos">
                {message.photos.map((photo, i) => {
                  const alt = `Photo ${i + 1} with ${message.authorName}'s message of ${formatStamp(message.createdAt)}`;
                  return (
                    <li key={photo.id}>
                      <PhotoButton photo={photo} alt={alt} onOpen={() => onOpenPhoto({ photo, alt, caption: `${message.authorName}'s photo, ${formatStamp(message.createdAt)}` })} />
                    </li>
                  );
                })}
              </ul>
            )}
          </li>
        ))}
      </ol>
    </details>
  );
}
