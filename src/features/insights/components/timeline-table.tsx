import { Link } from 'react-router-dom';
import type { DecadeCount, InsightsResponse, TimelineSpan } from '@shared/insights/schema';
import { Button } from '@/components/button';
import { decadeLabel } from '../lib/filters';
import { sizesText, styleOf } from '../lib/size-styles';
import { DataTable, type Column } from './data-table';
import { SizeMark } from './size-legend';

const spanColumns: Column<TimelineSpan>[] = [
  { header: 'Date', rowHeader: true, cell: (s) => <span className="figures">{s.dateLabel || `${s.yearEarliest}–${s.yearLatest}`}</span> },
  { header: 'Years', numeric: true, cell: (s) => (s.yearEarliest === s.yearLatest ? s.yearEarliest : `${s.yearEarliest}–${s.yearLatest}`) },
  { header: 'Exact?', cell: (s) => (s.approximate ? 'range or approximate' : 'one year') },
  {
    header: 'Sizes',
    cell: (s) => (
      <span className="inline-flex items-center gap-1.5">
        <SizeMark style={styleOf(s.sizes)} />
        {sizesText(s.sizes)}
      </span>
    ),
  },
  { header: 'Excerpt', cell: (s) => <Link to={`/excerpts/${encodeURIComponent(s.excerptId)}`}>{s.sourceTitle || s.excerptId}</Link> },
];

/** The timeline as tables: the excerpts' spans, and the decade counts with a button each. */
export function TimelineTable({ timeline, onDecade, decadeVerb }: { timeline: InsightsResponse['timeline']; onDecade: (decade: number) => void; decadeVerb: string }) {
  const decadeColumns: Column<DecadeCount>[] = [
    { header: 'Decade', rowHeader: true, cell: (d) => `${d.decade}–${d.decade + 9}` },
    { header: 'Excerpts', numeric: true, cell: (d) => d.count },
    {
      header: 'Filter',
      cell: (d) => (
        <Button size="sm" variant="quiet" onClick={() => onDecade(d.decade)} aria-label={`${decadeVerb} the ${decadeLabel(d.decade)}`}>
          {decadeVerb[0].toUpperCase() + decadeVerb.slice(1)} the {decadeLabel(d.decade)}
        </Button>
      ),
    },
  ];
  return (
    <div className="grid gap-4 lg:grid-cols-[2fr_1fr]">
      {timeline.spans.length ? (
        <DataTable caption={`Dated excerpts${timeline.truncated ? ' (the earliest; more match)' : ''}`} columns={spanColumns} rows={timeline.spans} rowKey={(s) => s.excerptId} />
      ) : (
        <p className="text-sm text-ink-muted">No dated excerpts to list.</p>
      )}
      <DataTable caption="Excerpts per decade" columns={decadeColumns} rows={timeline.decades} rowKey={(d) => String(d.decade)} />
    </div>
  );
}
