import { Button } from './button';

export interface PaginationProps {
  /** 1-based. */
  page: number;
  perPage: number;
  total: number;
  onPageChange: (page: number) => void;
  /** Names the navigation landmark, e.g. "Users pages". */
  label?: string;
  /** Word for the counted things, plural. */
  noun?: string;
  disabled?: boolean;
}

export function Pagination({
  page,
  perPage,
  total,
  onPageChange,
  label = 'Pages',
  noun = 'results',
  disabled = false,
}: PaginationProps) {
  const pageCount = Math.max(1, Math.ceil(total / Math.max(1, perPage)));
  const first = total === 0 ? 0 : (page - 1) * perPage + 1;
  const last = Math.min(total, page * perPage);
  return (
    <nav aria-label={label} className="mt-4 flex flex-wrap items-center justify-between gap-3 text-sm">
      <p className="figures text-ink-muted" aria-live="polite">
        {total === 0 ? `No ${noun}` : `${first}–${last} of ${total} ${noun}`}
      </p>
      <div className="flex items-center gap-2">
        <Button
          variant="secondary"
          size="sm"
          disabled={disabled || page <= 1}
          onClick={() => onPageChange(page - 1)}
        >
          <span aria-hidden="true">←</span> Previous
        </Button>
        <span className="figures text-ink-muted">
          Page {page} of {pageCount}
        </span>
        <Button
          variant="secondary"
          size="sm"
          disabled={disabled || page >= pageCount}
          onClick={() => onPageChange(page + 1)}
        >
          Next <span aria-hidden="true">→</span>
        </Button>
      </div>
    </nav>
  );
}
