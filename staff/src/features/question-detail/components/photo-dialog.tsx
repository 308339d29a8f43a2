import { useEffect, useId, useRef, useState } from "react";
import type { PhotoRef } from "#shared/schemas/questions";
import { Button } from "#shared/ui/index";

export interface PhotoDialogProps {
  photo: PhotoRef | null;
  alt: string;
  caption: string;
  onClose: () => void;
}

/**
 * A photo at full size in the browser's own modal <dialog> (focus trapped, Escape closes,
 * focus returns to the photo that opened it). "Zoom in" shows every pixel and lets the
 * picture scroll, for a close look at seedlings.
 */
export function PhotoDialog({ photo, alt, caption, onClose }: PhotoDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const [zoomed, setZoomed] = useState(false);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (photo && !dialog.open) dialog.showModal();
    if (!photo && dialog.open) dialog.close();
  }, [photo]);

  const close = () => {
    setZoomed(false);
    onClose();
  };

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onClose={close}
      className="m-auto h-[94dvh] w-[calc(100%-1rem)] max-w-6xl overflow-hidden rounded-xl border border-line bg-surface p-0 text-ink shadow-xl backdrop:bg-ink/80"
    >
      {photo && (
        <div className="flex h-full flex-col">
          <div className="flex flex-wrap items-center justify-between gap-2 border-b border-line p-3">
            <h2 id={titleId} className="text-xl text-pine-900">
              {caption}
            </h2>
            <div className="flex gap-2">
              <Button variant="secondary" aria-pressed={zoomed} onClick={() => setZoomed(!zoomed)}>
                {zoomed ? "Fit to screen" : "Zoom in"}
              </Button>
              <Button variant="primary" onClick={close}>
                Close
              </Button>
            </div>
          </div>
          {/* Focusable so the zoomed photo can be scrolled with the arrow keys. */}
          <div tabIndex={0} aria-label="Photo, scrollable when zoomed" className={`min-h-0 flex-1 bg-ink ${zoomed ? "overflow-auto" : "flex items-center justify-center overflow-hidden"}`}>
            <img
              src={photo.url}
              alt={alt}
              width={photo.width}
              height={photo.height}
              className={zoomed ? "max-w-none" : "h-full w-full object-contain"}
              style={zoomed ? { width: photo.width, height: photo.height } : undefined}
            />
          </div>
        </div>
      )}
    </dialog>
  );
}
