import { useMemo } from 'react';
import type { InsightsResponse } from '@shared/insights/schema';
import { YEAR_RANGE } from '@shared/search/schema';
import { scalesFor, sizesText, stylesIn } from '../lib/size-styles';
import { layOutSpans, timelineSummary } from '../lib/timeline';
import { MARGIN, usePlot } from '../lib/use-plot';
import { ChartFrame, PlotHost } from './chart-frame';
import { DecadeStrip } from './decade-strip';
import { SizeLegend } from './size-legend';
import { TimelineTable } from './timeline-table';

export interface TimelineChartProps {
  timeline: InsightsResponse['timeline'];
  total: number;
  onDecade: (decade: number) => void;
  selectedDecade?: number | null;
  /** "search" (from the home page) or "narrow the search to" (on the search page). */
  decadeVerb?: string;
  headingLevel?: 2 | 3;
}

const DOMAIN: [number, number] = [YEAR_RANGE.min, YEAR_RANGE.max];
const DECADE_BOX = { height: 120, top: 10, bottom: 28 };
const ink = 'var(--color-ink-muted)';

/**
 * Excerpts over 1500–1800, each its earliest–latest span (a range or an approximate
 * date as a pale dashed span), coloured and marked by size; beneath, excerpts per decade.
 */
export function TimelineChart({ timeline, total, onDecade, selectedDecade, decadeVerb = 'search', headingLevel = 2 }: TimelineChartProps) {
  const laid = useMemo(() => layOutSpans(timeline.spans), [timeline.spans]);
  const styles = useMemo(() => stylesIn(timeline.spans.map((s) => s.sizes)), [timeline.spans]);
  const summary = timelineSummary(timeline.spans, timeline.decades, total, timeline.truncated);
  const laneHeight = laid.lanes > 60 ? Math.max(3, Math.floor(480 / laid.lanes)) : laid.lanes > 20 ? 8 : 12;
  const spansHeight = Math.max(80, laid.lanes * laneHeight + 34);

  const spansPlot = usePlot(
    (Plot, width) => {
      const { color, symbol } = scalesFor(styles);
      const tip = { x1: 'yearEarliest', x2: 'yearLatest' } as const;
      const channels = { Source: 'sourceTitle', Date: 'dateLabel', Sizes: (d: { sizes: string[] }) => sizesText(d.sizes) };
      const exact = laid.spans.filter((s) => !s.approximate);
      const ranged = laid.spans.filter((s) => s.approximate);
      const bar = { x1: 'yearEarliest', x2: 'x2', y1: 'lane', y2: (d: { lane: number }) => d.lane + 0.78, fill: 'style', inset: 0 } as const;
      return Plot.plot({
        width,
        height: spansHeight,
        marginLeft: MARGIN.left,
        marginRight: MARGIN.right,
        marginTop: 6,
        marginBottom: 26,
        style: { background: 'transparent', fontSize: '12px', fontFamily: 'var(--font-sans)' },
        x: { domain: DOMAIN, tickFormat: 'd', label: null, grid: true },
        y: { axis: null, domain: [0, Math.max(1, laid.lanes)], reverse: true },
        color,
        symbol,
        marks: [
          Plot.rect(ranged, { ...bar, fillOpacity: 0.22, stroke: 'style', strokeDasharray: '3,2', strokeWidth: 1 }),
          Plot.rect(exact, { ...bar, fillOpacity: 0.9 }),
          Plot.dot(laid.spans, {
            x: (d: { yearEarliest: number; x2: number }) => (d.yearEarliest + d.x2) / 2,
            y: (d: { lane: number }) => d.lane + 0.39,
            symbol: 'style',
            fill: 'style',
            stroke: 'style',
            r: Math.min(3.5, laneHeight / 2 + 0.5),
            channels: { ...channels, From: tip.x1, To: tip.x2 },
            tip: { format: { x: false, y: false, symbol: false, fill: false, stroke: false } },
          }),
        ],
      });
    },
    `Timeline of ${timeline.spans.length} excerpts between ${DOMAIN[0]} and ${DOMAIN[1]}`,
    [laid, styles, spansHeight, laneHeight],
  );

  const decadePlot = usePlot(
    (Plot, width) =>
      Plot.plot({
        width,
        height: DECADE_BOX.height,
        marginLeft: MARGIN.left,
        marginRight: MARGIN.right,
        marginTop: DECADE_BOX.top,
        marginBottom: DECADE_BOX.bottom,
        style: { background: 'transparent', fontSize: '12px', fontFamily: 'var(--font-sans)' },
        x: { domain: DOMAIN, tickFormat: 'd', label: null },
        // Whole excerpts only: small counts get one tick per integer, not repeated rounded labels.
        y: { label: null, grid: true, ticks: integerTicks(Math.max(0, ...timeline.decades.map((d) => d.count))), tickFormat: 'd' },
        marks: [
          Plot.rectY(timeline.decades, {
            x1: 'decade',
            x2: (d: { decade: number }) => d.decade + 10,
            y: 'count',
            inset: 1,
            fill: (d: { decade: number }) => (d.decade === selectedDecade ? 'var(--color-accent-strong)' : 'var(--color-accent)'),
            fillOpacity: 0.85,
          }),
          Plot.text(timeline.decades.filter((d) => d.count > 0), {
            x: (d: { decade: number }) => d.decade + 5,
            y: 'count',
            text: (d: { count: number }) => String(d.count),
            dy: -6,
            fill: ink,
            fontSize: 10,
          }),
          Plot.ruleY([0], { stroke: ink }),
        ],
      }),
    'Excerpts per decade, 1500 to 1800',
    [timeline.decades, selectedDecade],
  );

  return (
    <ChartFrame
      title="When the sources speak"
      headingLevel={headingLevel}
      summary={summary}
      legend={
        <SizeLegend
          styles={styles}
          extra={
            <li className="inline-flex items-center gap-1.5">
              <span aria-hidden="true" className="inline-block h-2.5 w-6 rounded-[1px] border border-dashed border-ink-muted bg-ink-muted/20" />
              range or approximate date
            </li>
          }
        />
      }
      table={<TimelineTable timeline={timeline} onDecade={onDecade} decadeVerb={decadeVerb} />}
    >
      {timeline.spans.length > 0 && <PlotHost hostRef={spansPlot.ref} status={spansPlot.status} minHeight={spansHeight} />}
      <p className="label-caps mt-2 text-ink-muted">Excerpts per decade</p>
      <div className="relative" style={{ minHeight: DECADE_BOX.height }}>
        <PlotHost hostRef={decadePlot.ref} status={decadePlot.status} minHeight={DECADE_BOX.height} />
        <DecadeStrip
          decades={timeline.decades}
          onChoose={onDecade}
          selected={selectedDecade}
          verb={decadeVerb}
          className="absolute"
          style={{ left: MARGIN.left, right: MARGIN.right, top: DECADE_BOX.top, bottom: DECADE_BOX.bottom }}
        />
      </div>
      <p className="mt-1 text-sm text-ink-muted">Choose a decade bar (or focus the bars and use the arrow keys and Enter) to {decadeVerb} that decade.</p>
    </ChartFrame>
  );
}

/** Tick values for a count axis: every integer up to 4, otherwise Plot's own three nice ticks. */
function integerTicks(max: number): number[] | number {
  return max <= 4 ? Array.from({ length: max + 1 }, (_, i) => i) : 3;
}
