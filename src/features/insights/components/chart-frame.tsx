import { useId, useState, type ReactNode, type Ref } from 'react';
import { Button } from '@/components/button';
import { Spinner } from '@/components/spinner';
import type { PlotStatus } from '../lib/use-plot';

export interface ChartFrameProps {
  title: string;
  /** One or two sentences saying what the chart shows, for everyone (and its description). */
  summary: ReactNode;
  legend?: ReactNode;
  /** The chart body: one or more plot hosts (see PlotHost). */
  children: ReactNode;
  /** The same data as an accessible table, rendered when asked for. */
  table: ReactNode;
  headingLevel?: 2 | 3;
  /** Open the table from the start (e.g. when the chart has nothing to draw). */
  tableOpen?: boolean;
}

/** A chart with its heading, text summary, key and a "Show as table" alternative. */
export function ChartFrame({ title, summary, legend, children, table, headingLevel = 2, tableOpen = false }: ChartFrameProps) {
  const id = useId();
  const [showTable, setShowTable] = useState(tableOpen);
  const Heading = `h${headingLevel}` as const;
  return (
    <section aria-labelledby={`${id}-title`} aria-describedby={`${id}-summary`} className="m-0 rounded-soft border border-rule bg-paper-raised p-4 shadow-leaf sm:p-5">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <Heading id={`${id}-title`} className="font-serif text-xl font-medium text-ink">
          {title}
        </Heading>
        <Button size="sm" variant="quiet" aria-expanded={showTable} aria-controls={`${id}-table`} onClick={() => setShowTable((v) => !v)}>
          {showTable ? 'Hide table' : 'Show as table'}
        </Button>
      </div>
      <p id={`${id}-summary`} className="mt-1 max-w-reading text-[0.9375rem] text-ink-muted">
        {summary}
      </p>
      {legend && <div className="mt-3">{legend}</div>}
      <div className="mt-3">{children}</div>
      <div id={`${id}-table`} hidden={!showTable} className="mt-4">
        {showTable && table}
      </div>
    </section>
  );
}

/** The div a Plot is drawn into, with its loading and failure states. */
export function PlotHost({ hostRef, status, minHeight, className }: { hostRef: Ref<HTMLDivElement>; status: PlotStatus; minHeight: number; className?: string }) {
  return (
    <div className={className} style={{ minHeight }}>
      <div ref={hostRef} className="w-full text-ink [&_svg]:max-w-full [&_svg]:overflow-visible" />
      {status === 'loading' && <Spinner label="Drawing the chart…" className="text-ink-muted" />}
      {status === 'failed' && <p className="text-sm text-ink-muted">The chart could not be drawn here; “Show as table” has the same data.</p>}
    </div>
  );
}
