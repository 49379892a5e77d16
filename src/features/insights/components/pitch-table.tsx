import { Link } from 'react-router-dom';
import type { PitchPoint } from '@shared/insights/schema';
import { signedCents } from '../lib/pitch';
import { sizesText, styleOf } from '../lib/size-styles';
import { DataTable, type Column } from './data-table';
import { SizeMark } from './size-legend';

const columns: Column<PitchPoint>[] = [
  { header: 'Date', rowHeader: true, cell: (p) => <span className="figures">{p.dateLabel || p.year}</span> },
  { header: 'a′ (Hz)', numeric: true, cell: (p) => p.aHz },
  { header: 'Cents from 440', numeric: true, cell: (p) => signedCents(p.cents) },
  {
    header: 'Sizes',
    cell: (p) => (
      <span className="inline-flex items-center gap-1.5">
        <SizeMark style={styleOf(p.sizes)} />
        {sizesText(p.sizes)}
      </span>
    ),
  },
  { header: 'Excerpt', cell: (p) => <Link to={`/excerpts/${encodeURIComponent(p.excerptId)}`}>{p.sourceTitle || p.excerptId}</Link> },
];

export function PitchTable({ points }: { points: readonly PitchPoint[] }) {
  if (!points.length) return <p className="text-sm text-ink-muted">No pitch tags to list.</p>;
  return <DataTable caption="a′ of pitch tags by date" columns={columns} rows={points} rowKey={(p, i) => `${p.excerptId}-${p.aHz}-${i}`} />;
}
