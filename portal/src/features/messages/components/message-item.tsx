import { useTranslation } from "react-i18next";
import { Link } from "react-router-dom";
import type { PhotoRef, ThreadMessage } from "#shared/schemas/questions";
import { LinkifiedText, buttonClasses } from "#shared/ui/index";
import { formatMoment } from "../../../common/lib/dates.ts";

export interface MessageItemProps {
  message: ThreadMessage;
  onOpenPhoto: (photo: PhotoRef, alt: string) => void;
}

/** One message: the homeowner's on the right, the team's on the left, photo requests as requests. */
export function MessageItem({ message, onOpenPhoto }: MessageItemProps) {
  const { t, i18n } = useTranslation();
  const mine = message.authorRole === "customer";
  const request = message.kind === "check_in_request";
  const author = mine ? t("messages.you") : message.authorName;

  const frame = request
    ? "border-2 border-dashed border-loam-700 bg-loam-100"
    : mine
      ? "ml-auto border border-pine-700 bg-pine-50"
      : "mr-auto border border-line-strong bg-surface";

  return (
    <article className={`max-w-[90%] rounded-2xl p-4 sm:max-w-[75%] ${frame}`} aria-label={`${author}, ${formatMoment(message.createdAt, i18n.language)}`}>
      <header className="flex flex-wrap items-center gap-x-2 text-sm">
        {message.unread && <span className="rounded-full bg-rust-700 px-2 py-0.5 font-bold text-white">{t("messages.new")}</span>}
        {request && <span className="font-bold text-loam-700">{t("messages.checkInRequest")}</span>}
        <span className="font-bold">{author}</span>
        <time dateTime={message.createdAt} className="text-ink-soft">
          {formatMoment(message.createdAt, i18n.language)}
        </time>
      </header>
      <LinkifiedText text={message.text} className="mt-1" />
      {message.photos.length > 0 && (
        <ul className="mt-3 grid grid-cols-3 gap-2">
          {message.photos.map((photo, index) => {
            const alt = t("messages.photoAlt", { number: index + 1, author });
            return (
              <li key={photo.id}>
                <button
                  type="button"
                  onClick={() => onOpenPhoto(photo, t("messages.largePhoto", { number: index + 1, author }))}
                  aria-label={t("messages.openPhoto", { number: index + 1 })}
                  className="block w-full overflow-hidden rounded-lg border border-line"
                >
                  <img src={photo.thumbUrl} alt={alt} loading="lazy" className="aspect-square w-full object-cover" />
                </button>
              </li>
            );
          })}
        </ul>
      )}
      {request && (
        <Link to="/ask?checkin=1" className={buttonClasses("primary", "mt-3")}>
          {t("messages.addPhotos")}
        </Link>
      )}
    </article>
  );
}
