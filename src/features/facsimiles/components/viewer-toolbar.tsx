import { useEffect, useId, useState } from 'react';
import { Button } from '@/components/button';

export interface ViewerToolbarProps {
  page: number;
  pageCount: number | null;
  zoomPercent: number;
  fitting: boolean;
  onPage: (page: number) => void;
  onZoom: (direction: 1 | -1) => void;
  onFit: () => void;
  fileUrl: string;
}

export function ViewerToolbar({ page, pageCount, zoomPercent, fitting, onPage, onZoom, onFit, fileUrl }: ViewerToolbarProps) {
  const inputId = useId();
  const [typed, setTyped] = useState(String(page));
  useEffect(() => setTyped(String(page)), [page]);

  const commit = () => {
    const n = Number.parseInt(typed, 10);
    if (Number.isFinite(n) && n >= 1 && (!pageCount || n <= pageCount)) onPage(n);
    else setTyped(String(page));
  };

  return (
    <div role="toolbar" aria-label="Facsimile controls" className="flex flex-wrap items-center gap-2 border-b border-rule bg-paper-raised px-3 py-2 text-sm">
      <Button size="sm" variant="secondary" onClick={() => onPage(page - 1)} disabled={page <= 1} aria-keyshortcuts="PageUp">
        <span aria-hidden="true">‹</span> Previous<span className="sr-only"> page</span>
      </Button>
      <label htmlFor={inputId} className="sr-only">
        Page number
      </label>
      <input
        id={inputId}
        value={typed}
        inputMode="numeric"
        onChange={(event) => setTyped(event.target.value.replace(/\D/g, ''))}
        onBlur={commit}
        onKeyDown={(event) => {
          if (event.key === 'Enter') {
            event.preventDefault();
            commit();
          }
        }}
        className="figures w-14 rounded-soft border border-rule-strong bg-paper px-2 py-1 text-center"
      />
      <span className="figures text-ink-muted">of {pageCount ?? '…'}</span>
      <Button size="sm" variant="secondary" onClick={() => onPage(page + 1)} disabled={pageCount !== null && page >= pageCount} aria-keyshortcuts="PageDown">
        Next<span className="sr-only"> page</span> <span aria-hidden="true">›</span>
      </Button>
      <span className="mx-1 h-5 w-px bg-rule" aria-hidden="true" />
      <Button size="sm" variant="secondary" onClick={() => onZoom(-1)} aria-label="Zoom out" aria-keyshortcuts="-">
        −
      </Button>
      <span className="figures w-12 text-center text-ink-muted" aria-live="polite" aria-label={`Zoom ${zoomPercent} %`}>
        {zoomPercent} %
      </span>
      <Button size="sm" variant="secondary" onClick={() => onZoom(1)} aria-label="Zoom in" aria-keyshortcuts="+">
        +
      </Button>
      <Button size="sm" variant={fitting ? 'primary' : 'secondary'} onClick={onFit} aria-pressed={fitting} aria-keyshortcuts="W">
        Fit width
      </Button>
      <a href={fileUrl} className="ml-auto" download>
        Download
      </a>
    </div>
  );
}
