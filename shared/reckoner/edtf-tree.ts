import edtf, { parse } from 'edtf';
import { ReckonerError } from './errors';

/**
 * The parse tree of edtf 4.11 (`parse()`), which keeps values as written: unlike the
 * objects `edtf()` builds, it has not yet moved 1700-02-29 to 1 March, so we can refuse it.
 */
export type Qualifier = boolean | number | undefined;

export interface DateNode {
  type: 'Date';
  /** [year, month0?, day?, h?, m?, s?]; unspecified digits are given as 0. */
  values: number[];
  unspecified?: number;
  uncertain?: Qualifier;
  approximate?: Qualifier;
}
export interface SeasonNode { type: 'Season'; values: [number, number] }
export interface YearNode { type: 'Year'; values: [number] }
export interface DecadeNode { type: 'Decade'; values: [number] }
export interface CenturyNode { type: 'Century'; values: [number] }
export type PointNode = DateNode | SeasonNode | YearNode | DecadeNode | CenturyNode;
/** An end is a point, Infinity when open ("../1760") or null when unknown ("/1760"). */
export type IntervalEnd = PointNode | number | null;
export interface IntervalNode { type: 'Interval'; values: [IntervalEnd, IntervalEnd] }

export function isPoint(end: IntervalEnd): end is PointNode {
  return end !== null && typeof end === 'object';
}
/** A member of a set: one date, or a consecutive range written `a..b`. */
export type SetMember = PointNode | [PointNode, PointNode];
export interface SetNode { type: 'Set' | 'List'; values: SetMember[]; earlier?: boolean; later?: boolean }
export type EdtfNode = PointNode | IntervalNode | SetNode;

export interface ParsedEdtf {
  /** The value as given, trimmed. */
  input: string;
  tree: EdtfNode;
  /** edtf's own serialisation, when it can build the value. */
  canonical: string;
  /** For an interval: "/1760" or "1700/" (end unknown) rather than "../1760", "1700/.." (open). */
  unknownStart: boolean;
  unknownEnd: boolean;
}

export const EDTF_FORMS =
  'e.g. 1700, 1700-02-10, 1700~ (about), 1700? (uncertain), 169X (1690s), 1700/1725, ../1760, 1700/.., [1667,1668,1670..1672], {1667,1668}, 2001-21 (spring 2001)';

const BITS = { year: 0b1111, month: 0b110000, day: 0b11000000 };

/**
 * Parsed dates by input. The `edtf` grammar (nearley) takes a fraction of a millisecond per
 * date, and a page of citations or search hits parses the same few dates again and again.
 * Entries are frozen: callers share them.
 */
const parsedByInput = new Map<string, ParsedEdtf>();
const PARSED_CACHE_SIZE = 1000;

export function parseEdtf(value: string, field = 'value'): ParsedEdtf {
  const input = String(value ?? '').trim();
  const cached = parsedByInput.get(input);
  if (cached) return cached;
  const parsed = deepFreeze(parseUncached(input, field));
  if (parsedByInput.size >= PARSED_CACHE_SIZE) parsedByInput.delete(parsedByInput.keys().next().value!);
  parsedByInput.set(input, parsed);
  return parsed;
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object' && !Object.isFrozen(value)) {
    Object.freeze(value);
    for (const child of Object.values(value)) deepFreeze(child);
  }
  return value;
}

function parseUncached(input: string, field: string): ParsedEdtf {
  if (input === '') throw new ReckonerError(field, `A date is required: ${EDTF_FORMS}.`);
  let tree: EdtfNode;
  try {
    tree = parse(input) as EdtfNode;
  } catch {
    throw new ReckonerError(field, `"${input}" is not an EDTF date: ${EDTF_FORMS}.`);
  }
  let canonical = input;
  try {
    canonical = edtf(input).toEDTF();
  } catch {
    // edtf refuses some valid trees (e.g. 1700/1700); the bounds checks below decide instead.
  }
  return {
    input,
    tree,
    canonical,
    unknownStart: tree.type === 'Interval' && tree.values[0] === null,
    unknownEnd: tree.type === 'Interval' && tree.values[1] === null,
  };
}

function qualifierMask(q: Qualifier): number {
  return q === true ? 0xff : typeof q === 'number' ? q : 0;
}

export function isApproximate(node: DateNode): boolean {
  return qualifierMask(node.approximate) !== 0;
}
export function isUncertain(node: DateNode): boolean {
  return qualifierMask(node.uncertain) !== 0;
}

/** Which part of a date its ~ ? % qualifiers reach, the most significant first; null when unqualified. */
export function qualifiedPart(node: DateNode): 'year' | 'month' | 'day' | null {
  const whole = node.approximate === true || node.uncertain === true;
  if (whole) return datePrecision(node);
  const mask = qualifierMask(node.approximate) | qualifierMask(node.uncertain);
  if (mask & BITS.year) return 'year';
  if (mask & BITS.month) return 'month';
  if (mask & BITS.day) return 'day';
  return null;
}

export function datePrecision(node: DateNode): 'year' | 'month' | 'day' {
  return node.values.length >= 3 ? 'day' : node.values.length === 2 ? 'month' : 'year';
}

/** The date written as YYYYMMDD digits with X where EDTF left a digit unspecified. */
export function digitPattern(node: DateNode): { year: string; month: string; day: string } {
  const [year, month0 = 0, day = 1] = node.values;
  const digits = `${String(year).padStart(4, '0')}${String(month0 + 1).padStart(2, '0')}${String(day).padStart(2, '0')}`;
  const mask = node.unspecified ?? 0;
  const marked = digits.split('').map((d, i) => (mask & (1 << i) ? 'X' : d)).join('');
  const precision = datePrecision(node);
  return {
    year: marked.slice(0, 4),
    month: precision === 'year' ? '' : marked.slice(4, 6),
    day: precision === 'day' ? marked.slice(6, 8) : '',
  };
}

export function hasUnspecifiedDigits(node: DateNode): boolean {
  return (node.unspecified ?? 0) !== 0;
}

/** True for one fully specified calendar day, the only form that has a single Gregorian date and JD. */
export function isSingleDay(tree: EdtfNode): tree is DateNode {
  return tree.type === 'Date' && datePrecision(tree) === 'day' && !hasUnspecifiedDigits(tree);
}
