import { ConfirmDialog } from "#shared/ui/index";

export interface SaveConfirmProps {
  open: boolean;
  version: number;
  changedLabels: string[];
  pending: boolean;
  error: string | null;
  onConfirm: () => void;
  onCancel: () => void;
}

/** Names what changes and, just as important, what doesn't: plans already made keep their version. */
export function SaveConfirm({ open, version, changedLabels, pending, error, onConfirm, onCancel }: SaveConfirmProps) {
  return (
    <ConfirmDialog
      open={open}
      title={`Save as version ${version}?`}
      confirmLabel={`Save version ${version}`}
      pendingLabel="Saving…"
      pending={pending}
      error={error}
      onConfirm={onConfirm}
      onCancel={onCancel}
    >
      <p>Care plans made from now on use version {version}. Plans that already exist keep the version they were made with, so no homeowner's plan changes under them.</p>
      <p className="font-semibold">Changed:</p>
      <ul className="list-disc pl-5">
        {changedLabels.map((label) => (
          <li key={label}>{label}</li>
        ))}
      </ul>
    </ConfirmDialog>
  );
}
