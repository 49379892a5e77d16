import { useCallback, useEffect, useRef, useState, type KeyboardEvent } from 'react';
import type { FacsimileView } from '@shared/catalogue/types';
import { cn } from '@/lib/cn';
import { ImagePage } from './image-page';
import { PdfPage } from './pdf-page';
import { ViewerToolbar } from './viewer-toolbar';
import { fitZoom, stepZoom, type Zoom } from './zoom';

export interface FacsimileViewerProps {
  facsimile: FacsimileView;
  /** 1-based page shown. */
  page: number;
  onPageChange: (page: number) => void;
  className?: string;
}

const isPdf = (f: FacsimileView) => f.mediaType === 'application/pdf';

/**
 * A facsimile page beside the text: PDFs drawn by pdf.js (loaded on first use) with selectable text,
 * images at their own size; page turning, zoom and keyboard shortcuts
 * (Page Up/Down or ←/→ when the page fits, + and − to zoom, W to fit the width, Home/End).
 */
export function FacsimileViewer({ facsimile, page, onPageChange, className }: FacsimileViewerProps) {
  const pdf = isPdf(facsimile);
  const [pageCount, setPageCount] = useState<number | null>(pdf ? facsimile.pageCount : 1);
  const [zoom, setZoom] = useState<Zoom>({ mode: 'fit' });
  const [pageSize, setPageSize] = useState<{ width: number; height: number } | null>(null);
  const [available, setAvailable] = useState(0);
  const scrollRef = useRef<HTMLDivElement>(null);

  useEffect(() => {
    const element = scrollRef.current;
    if (!element || typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(([entry]) => setAvailable(Math.floor(entry.contentRect.width)));
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  const effectiveZoom = zoom.mode === 'fixed' ? zoom.value : fitZoom(available - 2, pageSize?.width ?? 0);
  const lastPage = pageCount ?? Number.POSITIVE_INFINITY;

  const goTo = useCallback(
    (next: number) => {
      const target = Math.min(Math.max(1, next), lastPage);
      if (target !== page) onPageChange(target);
    },
    [lastPage, onPageChange, page],
  );

  const zoomBy = (direction: 1 | -1) => setZoom({ mode: 'fixed', value: stepZoom(effectiveZoom, direction) });

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    const target = event.target as HTMLElement;
    if (target.closest('input, textarea, select') || event.altKey || event.ctrlKey || event.metaKey) return;
    const scroller = scrollRef.current;
    const pans = scroller ? scroller.scrollWidth > scroller.clientWidth + 1 : false;
    const actions: Record<string, () => void> = {
      PageUp: () => goTo(page - 1),
      PageDown: () => goTo(page + 1),
      Home: () => goTo(1),
      End: () => pageCount && goTo(pageCount),
      '+': () => zoomBy(1),
      '=': () => zoomBy(1),
      '-': () => zoomBy(-1),
      w: () => setZoom({ mode: 'fit' }),
      W: () => setZoom({ mode: 'fit' }),
      ...(pans ? {} : { ArrowLeft: () => goTo(page - 1), ArrowRight: () => goTo(page + 1) }),
    };
    const action = actions[event.key];
    if (!action) return;
    event.preventDefault();
    action();
  };

  const label = `${facsimile.originalName}, page ${page}${pageCount ? ` of ${pageCount}` : ''}`;

  return (
    <section
      aria-label="Facsimile viewer"
      onKeyDown={onKeyDown}
      className={cn('flex min-h-0 flex-col overflow-hidden rounded-soft border border-rule bg-paper-sunk', className)}
    >
      <ViewerToolbar
        page={page}
        pageCount={pageCount}
        zoomPercent={Math.round(effectiveZoom * 100)}
        fitting={zoom.mode === 'fit'}
        onPage={goTo}
        onZoom={zoomBy}
        onFit={() => setZoom({ mode: 'fit' })}
        fileUrl={facsimile.fileUrl}
      />
      <p className="sr-only" aria-live="polite">
        Page {page}
        {pageCount ? ` of ${pageCount}` : ''}
      </p>
      <div
        ref={scrollRef}
        tabIndex={0}
        aria-label={`Page image: ${label}. Page Up and Page Down turn pages; plus and minus zoom; W fits the width.`}
        className="min-h-64 flex-1 overflow-auto [scrollbar-gutter:stable] focus-visible:outline-offset-[-2px]"
      >
        {pdf ? (
          <PdfPage
            url={facsimile.fileUrl}
            page={page}
            zoom={effectiveZoom}
            label={label}
            onDocument={({ pageCount: count }) => setPageCount(count)}
            onPageSize={setPageSize}
          />
        ) : (
          <ImagePage url={facsimile.fileUrl} zoom={effectiveZoom} size={pageSize} onSize={setPageSize} alt={label} />
        )}
      </div>
      <p className="border-t border-rule px-3 py-1 text-xs text-ink-muted">
        Keys: <kbd>Page Up</kbd>/<kbd>Page Down</kbd> turn pages, <kbd>+</kbd>/<kbd>−</kbd> zoom, <kbd>W</kbd> fits the width.
        {pdf && ' Text on the page can be selected and copied.'}
      </p>
    </section>
  );
}
