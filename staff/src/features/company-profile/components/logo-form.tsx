import { useId, useRef, useState, type FormEvent } from "react";
import { logoLimits } from "#shared/schemas/company";
import { Button, FieldError, Notice, errorMessage } from "#shared/ui/index";
import { useUploadLogo } from "../api/upload-logo.ts";

/**
 * Upload or replace the logo. The server decides what is an image (from the bytes) and makes
 * the stored copy; the size check here only saves a long upload that would be refused anyway.
 */
export function LogoForm({ logoUrl, companyName }: { logoUrl: string | null; companyName: string }) {
  const upload = useUploadLogo();
  const inputRef = useRef<HTMLInputElement>(null);
  const inputId = useId();
  const errorId = useId();
  const [fieldError, setFieldError] = useState<string | null>(null);
  const [done, setDone] = useState(false);

  function submit(event: FormEvent) {
    event.preventDefault();
    setDone(false);
    const file = inputRef.current?.files?.[0];
    if (!file) return setFieldError("Choose an image file first.");
    if (file.size > logoLimits.maxBytes) return setFieldError(`The logo must be smaller than ${logoLimits.maxBytes / (1024 * 1024)} MB.`);
    setFieldError(null);
    upload.mutate(file, {
      onSuccess: () => {
        setDone(true);
        if (inputRef.current) inputRef.current.value = "";
      },
      onError: (error) => setFieldError(errorMessage(error)),
    });
  }

  return (
    <section aria-labelledby="logo-heading" className="rounded-xl border border-line bg-surface p-4">
      <h2 id="logo-heading" className="text-2xl text-pine-900">
        Logo
      </h2>
      <p className="mt-1 text-ink-soft">Shown next to your company name in the homeowner portal, in e-mails and on the printed plan.</p>
      <div className="mt-4 flex min-h-20 items-center gap-4 rounded-lg border border-dashed border-line-strong p-3">
        {logoUrl ? (
          <img src={logoUrl} alt={`Current logo of ${companyName}`} className="h-16 w-auto max-w-48 object-contain" />
        ) : (
          <p className="text-ink-soft">No logo yet. Homeowners see your company name on its own.</p>
        )}
      </div>
      <form noValidate onSubmit={submit} className="mt-4 flex flex-col gap-4">
        {done && <Notice tone="success">The new logo is saved. Homeowners see it the next time they open the portal.</Notice>}
        <div>
          <label htmlFor={inputId} className="block font-semibold">
            {logoUrl ? "New logo" : "Logo"} (PNG, JPEG or WebP)
          </label>
          <input
            id={inputId}
            ref={inputRef}
            type="file"
            accept="image/png,image/jpeg,image/webp"
            aria-invalid={fieldError ? true : undefined}
            aria-describedby={fieldError ? errorId : undefined}
            className="mt-2 block w-full min-h-12 text-base"
            onChange={() => setFieldError(null)}
          />
          {fieldError && <FieldError id={errorId} message={fieldError} />}
        </div>
        <Button type="submit" className="self-start" pending={upload.isPending} pendingLabel="Uploading…">
          Upload logo
        </Button>
      </form>
    </section>
  );
}
