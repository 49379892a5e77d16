import { useMemo, useState, type KeyboardEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import type { PitchPoint } from '@shared/insights/schema';
import { YEAR_RANGE } from '@shared/search/schema';
import { centTicks, centsFromHz, describePoint, hzDomain, pitchSummary, REFERENCE_LINES, signedCents } from '../lib/pitch';
import { scalesFor, sizesText, styleOf, stylesIn } from '../lib/size-styles';
import { MARGIN, usePlot } from '../lib/use-plot';
import { ChartFrame, PlotHost } from './chart-frame';
import { PitchTable } from './pitch-table';
import { SizeLegend } from './size-legend';

type Point = PitchPoint & { style: string };
const HEIGHT = 340;
const muted = 'var(--color-ink-muted)';

/**
 * a′ of pitch tags over time: year across, Hz up the left, cents from 440 up the
 * right; reference lines at the named standards; shape and colour by size. Hover or
 * step with the arrow keys for the excerpt; click or Enter opens it.
 */
export function PitchChart({ points: raw, truncated, headingLevel = 2 }: { points: readonly PitchPoint[]; truncated: boolean; headingLevel?: 2 | 3 }) {
  const navigate = useNavigate();
  const points = useMemo<Point[]>(() => [...raw].sort((a, b) => a.year - b.year || a.aHz - b.aHz).map((p) => ({ ...p, style: styleOf(p.sizes).key })), [raw]);
  const styles = useMemo(() => stylesIn(points.map((p) => p.sizes)), [points]);
  const [focused, setFocused] = useState<number | null>(null);
  const current = focused !== null && focused < points.length ? points[focused] : null;
  const open = (p: PitchPoint) => void navigate(`/excerpts/${encodeURIComponent(p.excerptId)}`);

  const plot = usePlot(
    (Plot, width) => {
      const domain = hzDomain(points);
      const { color, symbol } = scalesFor(styles);
      const chart = Plot.plot({
        width,
        height: HEIGHT,
        marginLeft: MARGIN.left,
        marginRight: 64,
        marginTop: 28,
        marginBottom: 30,
        style: { background: 'transparent', fontSize: '12px', fontFamily: 'var(--font-sans)' },
        x: { domain: [YEAR_RANGE.min, YEAR_RANGE.max], tickFormat: 'd', label: null, grid: true },
        y: { domain, label: null, grid: true },
        color,
        symbol,
        marks: [
          Plot.axisY({ anchor: 'left', label: 'a′ (Hz)', tickFormat: 'd' }),
          Plot.axisY(centTicks(domain), { anchor: 'right', label: 'cents from 440', tickFormat: (hz: number) => signedCents(centsFromHz(hz)) }),
          Plot.ruleY(REFERENCE_LINES, { y: 'hz', stroke: muted, strokeDasharray: '5,3', strokeOpacity: 0.8 }),
          Plot.text(REFERENCE_LINES, { x: YEAR_RANGE.min, y: 'hz', text: (r: { hz: number; name: string }) => `${r.name} · ${r.hz}`, textAnchor: 'start', dx: 4, dy: -6, fill: muted, fontSize: 11 }),
          Plot.ruleY(points.filter((p) => p.yearLatest > p.yearEarliest), { x1: 'yearEarliest', x2: (p: Point) => p.yearLatest + 1, y: 'aHz', stroke: 'style', strokeOpacity: 0.45, strokeWidth: 2 }),
          Plot.dot(points, {
            x: 'year',
            y: 'aHz',
            symbol: 'style',
            fill: 'style',
            stroke: 'style',
            fillOpacity: 0.85,
            r: 5,
            channels: { Source: 'sourceTitle', Date: 'dateLabel', Cents: (p: Point) => signedCents(p.cents), Sizes: (p: Point) => sizesText(p.sizes) },
            tip: { format: { x: false, symbol: false, fill: false, stroke: false, y: (hz: number) => `${hz} Hz` } },
          }),
          ...(current
            ? [
                Plot.dot([current], { x: 'year', y: 'aHz', r: 10, stroke: 'var(--color-ink)', strokeWidth: 2, fill: 'none' }),
                Plot.tip([current], { x: 'year', y: 'aHz', title: describePoint, anchor: 'bottom' }),
              ]
            : []),
        ],
      });
      chart.addEventListener('click', () => {
        const value = (chart as unknown as { value?: PitchPoint | null }).value;
        if (value) open(value);
      });
      chart.style.cursor = 'pointer';
      return chart;
    },
    `Pitch chart: ${points.length} a′ values between ${YEAR_RANGE.min} and ${YEAR_RANGE.max}, with reference lines at ${REFERENCE_LINES.map((r) => `${r.hz} Hz (${r.name})`).join(', ')}`,
    [points, styles, current],
  );

  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (!points.length) return;
    const step = { ArrowRight: 1, ArrowDown: 1, ArrowLeft: -1, ArrowUp: -1 }[event.key];
    if (step) {
      event.preventDefault();
      setFocused((i) => (i === null ? 0 : Math.max(0, Math.min(points.length - 1, i + step))));
    } else if (event.key === 'Home' || event.key === 'End') {
      event.preventDefault();
      setFocused(event.key === 'Home' ? 0 : points.length - 1);
    } else if (event.key === 'Enter' && current) {
      event.preventDefault();
      open(current);
    } else if (event.key === 'Escape') setFocused(null);
  };

  return (
    <ChartFrame
      title="At what pitch"
      headingLevel={headingLevel}
      summary={pitchSummary(points, truncated)}
      legend={<SizeLegend styles={styles} />}
      table={<PitchTable points={points} />}
    >
      {points.length > 0 && (
        <div
          tabIndex={0}
          role="group"
          aria-label="Pitch points: the arrow keys step through them by date, Enter opens the excerpt"
          onKeyDown={onKeyDown}
          onBlur={() => setFocused(null)}
          className="rounded-soft"
        >
          <PlotHost hostRef={plot.ref} status={plot.status} minHeight={HEIGHT} />
        </div>
      )}
      <p aria-live="polite" className="min-h-5 text-sm text-ink-muted">
        {current ? describePoint(current) : points.length ? 'Point at a dot, or focus the chart and use the arrow keys, to see its excerpt.' : ''}
      </p>
    </ChartFrame>
  );
}
