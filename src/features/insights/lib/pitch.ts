import type { PitchPoint } from '@shared/insights/schema';
import { PITCH_STANDARDS, MODERN_A4_HZ } from '@shared/reckoner/pitch';
import { PITCH_MARKS, PITCH_RANGE } from '@shared/search/schema';
import { sizesText } from './size-styles';

/** The reference lines: 392, 415, 440, 466 Hz with their standard names. */
export const REFERENCE_LINES = PITCH_MARKS.map((hz) => ({ hz, name: PITCH_STANDARDS.find((s) => s.hz === hz)?.shortName ?? `${hz} Hz` }));

export const hzFromCents = (cents: number) => MODERN_A4_HZ * 2 ** (cents / 1200);
export const centsFromHz = (hz: number) => 1200 * Math.log2(hz / MODERN_A4_HZ);

/** The Hz axis: the historical range, widened to any point outside it. */
export function hzDomain(points: readonly PitchPoint[]): [number, number] {
  const values = points.map((p) => p.aHz);
  return [Math.min(PITCH_RANGE.min, ...values.map((v) => v - 5)), Math.max(PITCH_RANGE.max, ...values.map((v) => v + 5))];
}

/** Round cent values (every 50) that fall in the Hz domain, as Hz positions for the right axis. */
export function centTicks([lo, hi]: [number, number]): number[] {
  const ticks: number[] = [];
  for (let c = Math.ceil(centsFromHz(lo) / 50) * 50; c <= centsFromHz(hi); c += 50) ticks.push(hzFromCents(c));
  return ticks;
}

export const signedCents = (cents: number) => `${cents > 0 ? '+' : cents < 0 ? '−' : '±'}${Math.abs(Math.round(cents * 10) / 10)}`;

/** What a point says, in words (tips, the live region, the table). */
export const describePoint = (p: PitchPoint) =>
  `${p.sourceTitle}, ${p.dateLabel || p.year}: a′ = ${p.aHz} Hz (${signedCents(p.cents)} cents from 440), ${sizesText(p.sizes)}`;

export function pitchSummary(points: readonly PitchPoint[], truncated: boolean): string {
  if (!points.length) return 'None of the excerpts found carries a pitch tag with a date in 1500–1800.';
  const hz = points.map((p) => p.aHz).sort((a, b) => a - b);
  const median = hz.length % 2 ? hz[(hz.length - 1) / 2] : (hz[hz.length / 2 - 1] + hz[hz.length / 2]) / 2;
  const excerpts = new Set(points.map((p) => p.excerptId)).size;
  const near = REFERENCE_LINES.map((r) => ({ ...r, n: hz.filter((h) => Math.abs(centsFromHz(h) - centsFromHz(r.hz)) <= 25).length })).sort((a, b) => b.n - a.n)[0];
  const years = points.map((p) => p.year);
  return [
    `${points.length} a′ ${points.length === 1 ? 'value' : 'values'} from ${excerpts} ${excerpts === 1 ? 'excerpt' : 'excerpts'}${truncated ? ' (the earliest; more match)' : ''}, dated ${Math.round(Math.min(...years))}–${Math.round(Math.max(...years))}`,
    `a′ from ${hz[0]} to ${hz[hz.length - 1]} Hz, median ${Math.round(median * 10) / 10} Hz`,
    near.n ? `${near.n} within a quarter-tone of ${near.name} pitch (${near.hz} Hz)` : '',
  ].filter(Boolean).join('; ') + '.';
}
