import { useEffect, useRef, useState, type DependencyList, type RefObject } from 'react';
import { loadPlot, type PlotModule } from './load-plot';

export type PlotStatus = 'loading' | 'ready' | 'failed';

/** Shared margins, so stacked charts and the decade buttons line up on one year axis. */
export const MARGIN = { left: 48, right: 20 } as const;
const FALLBACK_WIDTH = 640;

/** The width of an element, followed as it resizes (rounded, to avoid redraw loops). */
function useWidth(ref: RefObject<HTMLElement | null>): number {
  const [width, setWidth] = useState(0);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () => setWidth(Math.round(el.clientWidth) || FALLBACK_WIDTH);
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, [ref]);
  return width;
}

/**
 * Draws a Plot into a ref'd div: loads Plot on first use, redraws when `deps` or the
 * width change, and marks the SVG as one image with a label (its children are
 * presentational; the text summary and the table carry the data).
 */
export function usePlot(draw: (Plot: PlotModule, width: number) => SVGSVGElement | HTMLElement, label: string, deps: DependencyList) {
  const ref = useRef<HTMLDivElement>(null);
  const [status, setStatus] = useState<PlotStatus>('loading');
  const width = useWidth(ref);
  useEffect(() => {
    if (!width) return;
    let cancelled = false;
    let drawn: Element | null = null;
    loadPlot()
      .then((Plot) => {
        if (cancelled || !ref.current) return;
        drawn = draw(Plot, width);
        const svg = drawn instanceof SVGSVGElement ? drawn : drawn.querySelector('svg');
        svg?.setAttribute('role', 'img');
        svg?.setAttribute('aria-label', label);
        // Inside role="img" the marks are presentational; Plot's own aria-labels on them are not allowed there.
        svg?.querySelectorAll('[aria-label]').forEach((el) => {
          if (el !== svg) el.removeAttribute('aria-label');
        });
        ref.current.replaceChildren(drawn);
        setStatus('ready');
      })
      .catch((error: unknown) => {
        console.error('[insights] chart failed', error);
        if (!cancelled) setStatus('failed');
      });
    return () => {
      cancelled = true;
      drawn?.remove();
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [width, label, ...deps]);
  return { ref, status, width };
}
