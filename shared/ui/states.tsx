import type { ReactNode } from "react";
import { errorMessage } from "./api-client.ts";
import { Button, Spinner } from "./button.tsx";

export function LoadingState({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" className="flex items-center gap-3 py-8 text-ink-soft">
      <Spinner className="size-6 text-pine-700" />
      <span>{label}</span>
    </div>
  );
}

export interface ErrorStateProps {
  title?: string;
  error: unknown;
  /** Shown as a "Try again" button, e.g. a query's refetch. */
  onRetry?: () => void;
  retrying?: boolean;
  /** Overrides the error's own message, e.g. with a translated one. */
  message?: string;
  /** Labels of the retry button, for apps that translate their chrome. */
  retryLabel?: string;
  retryingLabel?: string;
}

export function ErrorState({
  title = "This didn't load",
  error,
  onRetry,
  retrying,
  message,
  retryLabel = "Try again",
  retryingLabel = "Trying again…",
}: ErrorStateProps) {
  return (
    <div role="alert" className="rounded-lg border-l-4 border-rust-700 bg-rust-50 p-4">
      <p className="font-bold text-rust-700">{title}</p>
      <p className="mt-1 text-rust-700">{message ?? errorMessage(error)}</p>
      {onRetry && (
        <Button variant="secondary" className="mt-3" onClick={onRetry} pending={retrying} pendingLabel={retryingLabel}>
          {retryLabel}
        </Button>
      )}
    </div>
  );
}

export interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  /** A decorative mark; hidden from screen readers. */
  icon?: ReactNode;
}

export function EmptyState({ title, children, icon }: EmptyStateProps) {
  return (
    <section className="rounded-xl border-2 border-dashed border-line bg-surface px-5 py-8 text-center">
      {icon && (
        <div aria-hidden="true" className="mx-auto mb-3 flex justify-center text-pine-700">
          {icon}
        </div>
      )}
      <h2 className="text-xl">{title}</h2>
      {children && <div className="mx-auto mt-2 max-w-prose text-ink-soft">{children}</div>}
    </section>
  );
}
