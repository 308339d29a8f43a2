import { Button } from "#shared/ui/index";

export interface SaveBarProps {
  nextVersion: number;
  changedCount: number;
  hasErrors: boolean;
  onSave: () => void;
  onDiscard: () => void;
  /** Milestones of the sample plan that moved; on phones the sample is far down, so the bar links to it. */
  previewChanges: number;
}

/** Stays in view at the bottom while scrolling the long list of settings. */
export function SaveBar({ nextVersion, changedCount, hasErrors, onSave, onDiscard, previewChanges }: SaveBarProps) {
  return (
    <div className="sticky bottom-0 z-10 -mx-4 border-t-2 border-line bg-surface px-4 py-3 shadow-[0_-4px_12px_rgba(0,0,0,0.06)]">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center justify-between gap-3">
        <div>
          <p aria-live="polite" className="font-semibold">
            {changedCount === 0
              ? "No changes yet."
              : hasErrors
                ? `${changedCount} ${changedCount === 1 ? "setting" : "settings"} changed; fix the marked ones to save.`
                : `${changedCount} ${changedCount === 1 ? "setting" : "settings"} changed.`}
          </p>
          {changedCount > 0 && (
            <a href="#program-preview-heading" className="inline-flex min-h-11 items-center lg:hidden">
              Sample plan: {previewChanges} {previewChanges === 1 ? "line" : "lines"} changed
            </a>
          )}
        </div>
        <div className="flex flex-wrap gap-2">
          {changedCount > 0 && (
            <Button variant="secondary" onClick={onDiscard}>
              Discard changes
            </Button>
          )}
          <Button onClick={onSave} disabled={changedCount === 0 || hasErrors}>
            Save as version {nextVersion}
          </Button>
        </div>
      </div>
    </div>
  );
}
