import { useMemo } from 'react';
import type { ConcordanceEntry } from '@shared/review/types';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { usePlot } from '../lib/use-plot';
import { ChartFrame, PlotHost } from './chart-frame';
import { DataTable, type Column } from './data-table';

/** One cell of the picture: a term as written (with its language) and a size it denotes. */
export interface ConcordanceCell {
  term: string;
  language: string;
  /** "flûte douce (fr)": the row label. */
  row: string;
  sizeSlug: string;
  sizeName: string;
  excerpts: number;
}

/** Rows drawn at most; the table lists every term. */
export const PICTURE_MAX_TERMS = 40;
const ROW = 24;
const order = new Map(INSTRUMENT_SIZES.map((s, i) => [s.slug, i]));

export function concordanceCells(entries: readonly ConcordanceEntry[]): ConcordanceCell[] {
  return entries.flatMap((e) =>
    e.sizes.map((s) => ({ term: e.term, language: e.language, row: `${e.term} (${e.language})`, sizeSlug: s.sizeSlug, sizeName: s.sizeName, excerpts: s.excerpts })),
  );
}

const columns: Column<ConcordanceCell>[] = [
  { header: 'Term as written', rowHeader: true, cell: (c) => <span className="font-serif italic">{c.term}</span> },
  { header: 'Language', cell: (c) => c.language },
  { header: 'Size', cell: (c) => c.sizeName },
  { header: 'Excerpts', numeric: true, cell: (c) => c.excerpts },
];

/**
 * Historical terms against the sizes they denote: a dot per pair, its area by the
 * number of approved excerpts, the number printed on it (so size is never the only cue).
 */
export function ConcordancePicture({ entries, headingLevel = 2 }: { entries: readonly ConcordanceEntry[]; headingLevel?: 2 | 3 }) {
  const all = useMemo(() => concordanceCells(entries), [entries]);
  const top = useMemo(() => [...entries].sort((a, b) => b.excerpts - a.excerpts || a.term.localeCompare(b.term)).slice(0, PICTURE_MAX_TERMS), [entries]);
  const cells = useMemo(() => concordanceCells(top), [top]);
  const rows = useMemo(() => [...new Set(cells.map((c) => c.row))].sort((a, b) => a.localeCompare(b)), [cells]);
  const sizes = useMemo(() => {
    const names = new Map(cells.map((c) => [c.sizeSlug, c.sizeName]));
    return [...names.keys()].sort((a, b) => (order.get(a) ?? 99) - (order.get(b) ?? 99)).map((slug) => names.get(slug)!);
  }, [cells]);
  const height = rows.length * ROW + 70;
  const maxCount = Math.max(1, ...cells.map((c) => c.excerpts));

  const plot = usePlot(
    (Plot, width) =>
      Plot.plot({
        width: Math.max(width, 360),
        height,
        marginLeft: Math.min(220, 12 + Math.max(...rows.map((r) => r.length)) * 6.5),
        marginBottom: 10,
        marginTop: 56,
        style: { background: 'transparent', fontSize: '12px', fontFamily: 'var(--font-sans)' },
        x: { domain: sizes, axis: 'top', label: null, tickRotate: -25, grid: true },
        y: { domain: rows, label: null, grid: true },
        r: { domain: [0, maxCount], range: [0, Math.min(11, ROW / 2 - 1)] },
        marks: [
          Plot.dot(cells, { x: 'sizeName', y: 'row', r: 'excerpts', fill: 'var(--color-accent)', fillOpacity: 0.75, stroke: 'var(--color-accent-strong)', title: (c: ConcordanceCell) => `${c.row} → ${c.sizeName}: ${c.excerpts}` }),
          Plot.text(cells, { x: 'sizeName', y: 'row', text: (c: ConcordanceCell) => String(c.excerpts), fill: 'var(--color-ink)', stroke: 'var(--color-paper-raised)', strokeWidth: 3, fontSize: 10, dx: 14, textAnchor: 'start' }),
        ],
      }),
    `Concordance: ${rows.length} historical terms against ${sizes.length} instrument sizes, dots sized by the number of excerpts`,
    [cells, rows, sizes, height, maxCount],
  );

  const summary = entries.length
    ? `${entries.length} historical ${entries.length === 1 ? 'term' : 'terms'} for ${new Set(all.map((c) => c.sizeSlug)).size} sizes, from approved excerpts. Each dot is a term (as written, with its language) used for a size; its area and the number beside it give the excerpts.${entries.length > PICTURE_MAX_TERMS ? ` The picture shows the ${PICTURE_MAX_TERMS} most-used terms; the table lists all.` : ''}`
    : 'No approved excerpt names an instrument yet, so the concordance is empty.';

  return (
    <ChartFrame title="Terms and sizes" headingLevel={headingLevel} summary={summary} table={<DataTable caption="Historical terms and the sizes they denote" columns={columns} rows={all} rowKey={(c) => `${c.row}-${c.sizeSlug}`} />}>
      {cells.length > 0 && (
        <div className="overflow-x-auto">
          <PlotHost hostRef={plot.ref} status={plot.status} minHeight={height} />
        </div>
      )}
    </ChartFrame>
  );
}
