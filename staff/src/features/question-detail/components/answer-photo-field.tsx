import { useId, useRef } from "react";
import { photoLimits } from "#shared/schemas/questions";
import { Button, FieldError } from "#shared/ui/index";

export interface AnswerPhotoFieldProps {
  photo: File | null;
  error?: string;
  onChange: (photo: File | null, error?: string) => void;
}

const maxMb = Math.round(photoLimits.maxBytes / 1024 / 1024);

/** One optional photo with the answer, e.g. a marked-up picture of where to rake. */
export function AnswerPhotoField({ photo, error, onChange }: AnswerPhotoFieldProps) {
  const inputId = useId();
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  const input = useRef<HTMLInputElement>(null);

  const pick = (file: File | undefined) => {
    if (!file) return onChange(null);
    if (!(photoLimits.acceptedTypes as readonly string[]).includes(file.type)) return onChange(null, "Choose a JPEG, PNG, WebP or HEIC photo");
    if (file.size > photoLimits.maxBytes) return onChange(null, `Choose a photo under ${maxMb} MB`);
    onChange(file);
  };

  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={inputId} className="font-semibold">
        Photo (optional)
      </label>
      <p id={hintId} className="text-base text-ink-soft">
        One photo, up to {maxMb} MB.
      </p>
      {photo ? (
        <div className="flex flex-wrap items-center gap-3">
          <span className="[overflow-wrap:anywhere]">{photo.name}</span>
          <Button
            variant="quiet"
            onClick={() => {
              if (input.current) input.current.value = "";
              onChange(null);
            }}
          >
            Remove photo
          </Button>
        </div>
      ) : null}
      <input
        ref={input}
        id={inputId}
        type="file"
        accept={photoLimits.acceptedTypes.join(",")}
        aria-describedby={[hintId, error ? errorId : ""].filter(Boolean).join(" ")}
        aria-invalid={error ? true : undefined}
        onChange={(event) => pick(event.target.files?.[0])}
        className={`min-h-12 w-full rounded-lg border-2 border-dashed bg-surface p-2 text-base file:mr-3 file:min-h-10 file:rounded-md file:border-0 file:bg-pine-100 file:px-3 file:font-semibold file:text-pine-900 ${photo ? "hidden" : "border-line-strong"}`}
      />
      {error && <FieldError id={errorId} message={error} />}
    </div>
  );
}
