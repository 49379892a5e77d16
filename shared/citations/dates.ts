import { describeEdtf } from '../reckoner/dates';
import {
  datePrecision, digitPattern, hasUnspecifiedDigits, isApproximate, isPoint, isUncertain, parseEdtf,
  type DateNode, type IntervalEnd, type PointNode,
} from '../reckoner/edtf-tree';

/** A CSL date (CSL 1.0.2 "Date-variables"; csl-data.json `date-variable`). */
export interface CslDate {
  'date-parts'?: number[][];
  circa?: boolean;
  season?: number;
  literal?: string;
}

type Parts = number[];

/**
 * EDTF → CSL date, the way Chicago styles expect it:
 * - a day, month or year → `date-parts` of that precision;
 * - approximate (`~`) **and** uncertain (`?`, `%`) → `circa: true`. CSL has no "uncertain" flag;
 *   Chicago's CSL prints circa as "[1700?]", which is CMOS's own form for a doubtful date, so both
 *   qualifiers end up as CMOS writes them (a `literal` would break sorting and BibTeX/RIS years);
 * - unspecified digits (169X), decades and centuries → two date-parts (1690–1699);
 * - a closed interval (1700/1725) → two date-parts; circa if either end is qualified;
 * - what CSL cannot express as parts — open or unknown interval ends ("before 1760"),
 *   sets and lists ("1667, 1668 or 1670–1672") — → `literal` with Windway's label.
 */
export function edtfToCslDate(edtf: string | null | undefined): CslDate | undefined {
  if (!edtf) return undefined;
  let parsed;
  try {
    parsed = parseEdtf(edtf);
  } catch {
    return undefined;
  }
  const { tree } = parsed;
  if (tree.type === 'Interval') {
    const [start, end] = tree.values;
    if (!isPoint(start) || !isPoint(end)) return { literal: describeEdtf(edtf).label };
    const from = pointRange(start);
    const to = pointRange(end);
    return withCirca({ 'date-parts': [from[0], to[1]] }, qualified(start) || qualified(end));
  }
  if (tree.type === 'Set' || tree.type === 'List') return { literal: describeEdtf(edtf).label };
  if (tree.type === 'Season') {
    const [year, code] = tree.values;
    const season = code >= 21 && code <= 24 ? code - 20 : undefined;
    return season ? { 'date-parts': [[year]], season } : { 'date-parts': [[year]] };
  }
  const point = tree as PointNode;
  const [first, last] = pointRange(point);
  const parts = samePart(first, last) ? { 'date-parts': [first] } : { 'date-parts': [first, last] };
  return withCirca(parts, qualified(point));
}

function withCirca(date: CslDate, circa: boolean): CslDate {
  return circa ? { ...date, circa: true } : date;
}

function qualified(node: PointNode | IntervalEnd): boolean {
  return isPoint(node) && node.type === 'Date' && (isApproximate(node) || isUncertain(node));
}

function samePart(a: Parts, b: Parts): boolean {
  return a.length === b.length && a.every((v, i) => v === b[i]);
}

/** First and last CSL date-parts a point covers (equal for a plain date). */
function pointRange(node: PointNode): [Parts, Parts] {
  switch (node.type) {
    case 'Year':
      return [[node.values[0]], [node.values[0]]];
    case 'Decade':
      return [[node.values[0] * 10], [node.values[0] * 10 + 9]];
    case 'Century':
      return [[node.values[0] * 100], [node.values[0] * 100 + 99]];
    case 'Season':
      return [[node.values[0]], [node.values[0]]];
    case 'Date':
      return dateRange(node);
  }
}

function dateRange(node: DateNode): [Parts, Parts] {
  const precision = datePrecision(node);
  if (!hasUnspecifiedDigits(node)) {
    const [year, month0, day] = node.values;
    const parts = precision === 'day' ? [year, month0 + 1, day] : precision === 'month' ? [year, month0 + 1] : [year];
    return [parts, parts];
  }
  // Unspecified digits: keep the year span (169X → 1690–1699); month/day detail is dropped.
  const { year } = digitPattern(node);
  return [[Number(year.replace(/X/g, '0'))], [Number(year.replace(/X/g, '9'))]];
}

/** Today as CSL date-parts (the `accessed` date). */
export function cslToday(now: Date = new Date()): CslDate {
  return { 'date-parts': [[now.getUTCFullYear(), now.getUTCMonth() + 1, now.getUTCDate()]] };
}

/** First year of a CSL date, for import and duplicate checks. */
export function firstYear(date: CslDate | undefined): number | undefined {
  const y = date?.['date-parts']?.[0]?.[0];
  return typeof y === 'number' ? y : y ? Number(y) : undefined;
}
