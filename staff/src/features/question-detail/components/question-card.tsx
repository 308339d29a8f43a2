import type { ThreadMessage } from "#shared/schemas/questions";
import { formatStamp, type OpenPhoto } from "../lib/photo-viewing.ts";
import { PhotoButton } from "./photo-button.tsx";

/** The question being answered: the homeowner's words and their photos, large. */
export function QuestionCard({ message, onOpenPhoto }: { message: ThreadMessage; onOpenPhoto: OpenPhoto }) {
  const stamp = formatStamp(message.createdAt);
  return (
    <article className="rounded-xl border border-line bg-surface p-4 sm:p-5" data-testid="question-card">
      <p className="text-ink-soft">
        <strong className="text-ink">{message.authorName}</strong> asked on <time dateTime={message.createdAt}>{stamp}</time>
      </p>
      <p className="mt-2 text-lg whitespace-pre-line [overflow-wrap:anywhere]">{message.text}</p>
      {message.photos.length > 0 && (
        <ul className={`mt-4 grid gap-3 ${message.photos.length > 1 ? "sm:grid-cols-2" : ""}`} aria-label="Photos with this question">
          {message.photos.map((photo, i) => {
            const alt = `Photo ${i + 1} of ${message.photos.length} with ${message.authorName}'s question of ${stamp}`;
            return (
              <li key={photo.id}>
                <PhotoButton photo={photo} alt={alt} size="large" className="w-full" onOpen={() => onOpenPhoto({ photo, alt, caption: `${message.authorName}'s photo, ${stamp}` })} />
              </li>
            );
          })}
        </ul>
      )}
    </article>
  );
}
