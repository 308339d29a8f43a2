import type { ReactNode } from "react";
import { Button, type ButtonVariant } from "./button.tsx";
import { Dialog } from "./dialog.tsx";
import { Notice } from "./notice.tsx";

export interface ConfirmDialogProps {
  open: boolean;
  title: string;
  /** What will happen, in plain words ("This ends their sessions at once."). */
  children?: ReactNode;
  confirmLabel: string;
  pendingLabel?: string;
  cancelLabel?: string;
  /** "danger" for things that can't simply be undone. */
  variant?: ButtonVariant;
  pending?: boolean;
  /** A message from a failed attempt, shown in the dialog so the person can try again or cancel. */
  error?: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Asks "are you sure?" before a change that matters, naming what it will do. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  pendingLabel,
  cancelLabel = "Cancel",
  variant = "primary",
  pending,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog open={open} onClose={onCancel} title={title}>
      {children && <div className="flex flex-col gap-2">{children}</div>}
      {error && <Notice tone="danger">{error}</Notice>}
      <div className="flex flex-wrap justify-end gap-2">
        <Button variant="secondary" onClick={onCancel}>
          {cancelLabel}
        </Button>
        <Button variant={variant} onClick={onConfirm} pending={pending} pendingLabel={pendingLabel}>
          {confirmLabel}
        </Button>
      </div>
    </Dialog>
  );
}
