import { Button } from "#shared/ui/index";

export interface PagerProps {
  offset: number;
  limit: number;
  total: number;
  onPage: (offset: number) => void;
}

/** "Showing 26–50 of 132" with previous and next; the count is announced when it changes. */
export function Pager({ offset, limit, total, onPage }: PagerProps) {
  if (total === 0) return null;
  const first = offset + 1;
  const last = Math.min(offset + limit, total);
  return (
    <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3">
      <p aria-live="polite" className="text-ink-soft">
        Showing {first}–{last} of {total}
      </p>
      <div className="flex gap-2">
        <Button variant="secondary" disabled={offset === 0} onClick={() => onPage(Math.max(0, offset - limit))}>
          Previous
        </Button>
        <Button variant="secondary" disabled={last >= total} onClick={() => onPage(offset + limit)}>
          Next
        </Button>
      </div>
    </nav>
  );
}
