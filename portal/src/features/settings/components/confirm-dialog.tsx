import { useEffect, useId, useRef } from "react";
import { Button } from "#shared/ui/index";

export interface ConfirmDialogProps {
  open: boolean;
  message: string;
  confirmLabel: string;
  cancelLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks before something that can't be undone; a native modal dialog handles focus and Escape. */
export function ConfirmDialog({ open, message, confirmLabel, cancelLabel, onConfirm, onCancel }: ConfirmDialogProps) {
  const dialogRef = useRef<HTMLDialogElement>(null);
  const messageId = useId();
  useEffect(() => {
    const dialog = dialogRef.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={dialogRef}
      role="alertdialog"
      aria-labelledby={messageId}
      onClose={onCancel}
      className="m-auto w-[min(30rem,calc(100vw-2rem))] rounded-2xl border-2 border-line-strong bg-surface p-5 text-ink backdrop:bg-ink/50"
    >
      <p id={messageId} className="text-lg font-semibold">
        {message}
      </p>
      <div className="mt-4 flex flex-wrap gap-3">
        <Button variant="danger" onClick={onConfirm}>
          {confirmLabel}
        </Button>
        <Button variant="secondary" onClick={onCancel} autoFocus>
          {cancelLabel}
        </Button>
      </div>
    </dialog>
  );
}
