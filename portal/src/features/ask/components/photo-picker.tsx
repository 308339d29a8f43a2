import { useEffect, useId, useMemo } from "react";
import { useTranslation } from "react-i18next";
import { photoLimits } from "#shared/schemas/questions";
import { maxPhotoMegabytes } from "../lib/check-photos.ts";

export interface PhotoPickerProps {
  photos: readonly File[];
  onAdd: (files: File[]) => void;
  onRemove: (index: number) => void;
  /** Problems with the photos, shown in place under the picker. */
  errors: readonly string[];
  disabled?: boolean;
}

/** Choose up to six photos, see them, take any back out. */
export function PhotoPicker({ photos, onAdd, onRemove, errors, disabled }: PhotoPickerProps) {
  const { t } = useTranslation();
  const inputId = useId();
  const hintId = useId();
  const errorId = useId();
  const previews = usePreviewUrls(photos);
  const full = photos.length >= photoLimits.maxCount;

  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={errors.length ? `${hintId} ${errorId}` : hintId}>
      <legend className="font-semibold">{t("ask.photosLabel", { max: photoLimits.maxCount })}</legend>
      <p id={hintId} className="text-base text-ink-soft">
        {t("ask.photosHint", { size: maxPhotoMegabytes })}
      </p>

      {photos.length > 0 && (
        <ul className="grid grid-cols-3 gap-2 sm:grid-cols-6">
          {photos.map((photo, index) => (
            <li key={`${photo.name}-${photo.lastModified}-${index}`} className="relative">
              <img src={previews[index]} alt={t("ask.photoAlt", { number: index + 1 })} className="aspect-square w-full rounded-lg border border-line object-cover" />
              <button
                type="button"
                disabled={disabled}
                onClick={() => onRemove(index)}
                aria-label={t("ask.removePhoto", { number: index + 1 })}
                className="absolute top-1 right-1 flex size-11 items-center justify-center rounded-full bg-ink text-xl font-bold text-white disabled:opacity-60"
              >
                <span aria-hidden="true">×</span>
              </button>
            </li>
          ))}
        </ul>
      )}

      <div>
        {/* The real input stays focusable (visually hidden); its label is the big button people see. */}
        <input
          id={inputId}
          type="file"
          accept={[...photoLimits.acceptedTypes, ".heic", ".heif"].join(",")}
          multiple
          disabled={disabled || full}
          className="peer sr-only"
          onChange={(event) => {
            onAdd([...(event.target.files ?? [])]);
            event.target.value = ""; // picking the same photo again should still fire a change
          }}
        />
        <label
          htmlFor={inputId}
          className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded-lg border-2 border-pine-700 bg-surface px-5 py-2 font-semibold text-pine-700 peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus peer-disabled:cursor-not-allowed peer-disabled:opacity-60"
        >
          <CameraIcon />
          {t("ask.addPhotos")}
        </label>
      </div>

      {errors.length > 0 && (
        <ul id={errorId} role="alert" className="space-y-1 font-semibold text-rust-700">
          {errors.map((message) => (
            <li key={message} className="flex items-start gap-1">
              <span aria-hidden="true">⚠</span>
              {message}
            </li>
          ))}
        </ul>
      )}
    </fieldset>
  );
}

/** Object URLs for the previews, released when photos change or the form goes away. */
function usePreviewUrls(photos: readonly File[]): string[] {
  const urls = useMemo(() => photos.map((photo) => URL.createObjectURL(photo)), [photos]);
  useEffect(() => () => urls.forEach((url) => URL.revokeObjectURL(url)), [urls]);
  return urls;
}

function CameraIcon() {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" focusable="false" className="size-5" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round">
      <path d="M4 8.5h3l1.5-2h7l1.5 2h3v11H4z" />
      <circle cx="12" cy="13.5" r="3.2" />
    </svg>
  );
}
