import type { DecadeCount, TimelineSpan } from '@shared/insights/schema';
import { styleOf } from './size-styles';

export interface LaidSpan extends TimelineSpan {
  lane: number;
  /** Drawn end: the last year is included, so a one-year date is a year wide. */
  x2: number;
  style: string;
}

/** Packs spans into as few lanes as possible (earliest first, first lane free), keeping each span whole. */
export function layOutSpans(spans: readonly TimelineSpan[]): { spans: LaidSpan[]; lanes: number } {
  const ends: number[] = [];
  const sorted = [...spans].sort((a, b) => a.yearEarliest - b.yearEarliest || a.yearLatest - b.yearLatest);
  const out = sorted.map((span) => {
    let lane = ends.findIndex((end) => end <= span.yearEarliest);
    if (lane === -1) lane = ends.push(0) - 1;
    const x2 = span.yearLatest + 1;
    ends[lane] = x2 + 0.5;
    return { ...span, lane, x2, style: styleOf(span.sizes).key };
  });
  return { spans: out, lanes: ends.length };
}

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;

/** The text alternative of the timeline, in a sentence or two. */
export function timelineSummary(spans: readonly TimelineSpan[], decades: readonly DecadeCount[], total: number, truncated: boolean): string {
  if (!spans.length) return total ? `None of the ${plural(total, 'excerpt')} found is dated between 1500 and 1800.` : 'No excerpts match, so there is nothing to place on the timeline.';
  const first = Math.min(...spans.map((s) => s.yearEarliest));
  const last = Math.max(...spans.map((s) => s.yearLatest));
  const ranged = spans.filter((s) => s.approximate).length;
  const peak = decades.reduce((best, d) => (d.count > best.count ? d : best), decades[0]);
  const parts = [
    `${plural(spans.length, 'dated excerpt')} between ${first} and ${last}${truncated ? ' (the earliest shown; more match)' : ''}`,
    ranged ? `${ranged.toLocaleString('en-GB')} of them ${ranged === 1 ? 'is' : 'are'} dated only to a range or approximately (pale, dashed spans)` : '',
    peak && peak.count ? `most fall in the ${peak.decade}s (${plural(peak.count, 'excerpt')})` : '',
  ].filter(Boolean);
  const undated = total - spans.length;
  return `${parts.join('; ')}.${undated > 0 && !truncated ? ` ${plural(undated, 'further excerpt')} without a date in the period ${undated === 1 ? 'is' : 'are'} not shown.` : ''}`;
}
