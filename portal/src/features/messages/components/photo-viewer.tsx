import { useEffect, useRef } from "react";
import { useTranslation } from "react-i18next";
import type { PhotoRef } from "#shared/schemas/questions";
import { Button } from "#shared/ui/index";

export interface PhotoViewerProps {
  photo: PhotoRef | null;
  alt: string;
  onClose: () => void;
}

/** A photo at full size in a modal; Escape or the button closes it and focus returns to the thumbnail. */
export function PhotoViewer({ photo, alt, onClose }: PhotoViewerProps) {
  const { t } = useTranslation();
  const dialogRef = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = dialogRef.current;
    if (!dialog) return;
    if (photo && !dialog.open) dialog.showModal();
    if (!photo && dialog.open) dialog.close();
  }, [photo]);

  return (
    <dialog
      ref={dialogRef}
      aria-label={alt}
      onClose={onClose}
      className="m-auto max-h-[95dvh] w-[min(64rem,calc(100vw-1rem))] rounded-xl bg-surface p-2 backdrop:bg-ink/80"
    >
      {photo && (
        <div className="flex flex-col items-end gap-2">
          <Button variant="secondary" onClick={onClose} autoFocus>
            {t("messages.closePhoto")}
          </Button>
          <img src={photo.url} alt={alt} width={photo.width} height={photo.height} className="h-auto max-h-[80dvh] w-full rounded-lg object-contain" />
        </div>
      )}
    </dialog>
  );
}
