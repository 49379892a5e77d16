import { ReckonerError } from './errors';
import { assertValidDate, daysInMonth, julianDayNumber, modernYearFromLadyDay, type CalendarDate, type CalendarName } from './calendar';
import { mod } from './notes';
import { datePrecision, digitPattern, hasUnspecifiedDigits, isPoint, qualifiedPart, type EdtfNode, type PointNode, type SetMember } from './edtf-tree';

export type YearStart = 'jan1' | 'mar25';

export interface Reading {
  /** Calendar the value was written in. */
  calendar: CalendarName;
  /** Whether the writer's year began on 1 January or on Lady Day, 25 March. */
  yearStart: YearStart;
  /** Widen ~ ? % dates by QUALIFIED_DATE_MARGIN (true for range search). */
  widen: boolean;
}

/**
 * How far an approximate (~), uncertain (?) or both (%) date is widened on each side, by
 * the most significant part the qualifier reaches: "c. 1700" covers 1695–1705. Our choice:
 * edtf 4.11 does not widen at all, which makes "c. 1700" miss a search for 1690–1699.
 */
export const QUALIFIED_DATE_MARGIN = { years: 5, months: 1, days: 7 } as const;

/** Chronological Julian Day Numbers of the first and last day; ±Infinity for an open end. */
export interface DayBounds {
  first: number;
  last: number;
}

export function boundsOf(tree: EdtfNode, reading: Reading, field = 'value'): DayBounds {
  switch (tree.type) {
    case 'Interval': {
      const [start, end] = tree.values;
      const first = isPoint(start) ? pointBounds(start, reading, field).first : -Infinity;
      const last = isPoint(end) ? pointBounds(end, reading, field).last : Infinity;
      if (isPoint(start) && isPoint(end) && pointBounds(end, reading, field).last < pointBounds(start, reading, field).first) {
        throw new ReckonerError(field, 'The interval ends before it begins: write the earlier date first, e.g. 1700/1725.');
      }
      return { first, last };
    }
    case 'Set':
    case 'List': {
      const members = tree.values.map((m) => memberBounds(m, reading, field));
      return {
        first: tree.earlier ? -Infinity : Math.min(...members.map((b) => b.first)),
        last: tree.later ? Infinity : Math.max(...members.map((b) => b.last)),
      };
    }
    default:
      return pointBounds(tree, reading, field);
  }
}

function memberBounds(member: SetMember, reading: Reading, field: string): DayBounds {
  if (!Array.isArray(member)) return pointBounds(member, reading, field);
  return { first: pointBounds(member[0], reading, field).first, last: pointBounds(member[1], reading, field).last };
}

/** Meteorological seasons, Northern Hemisphere unless the code says Southern (Windway's sources are European). */
const SEASON_MONTHS: Record<number, [number, number]> = {
  21: [3, 5], 22: [6, 8], 23: [9, 11], 24: [12, 14],
  25: [3, 5], 26: [6, 8], 27: [9, 11], 28: [12, 14],
  29: [9, 11], 30: [12, 14], 31: [3, 5], 32: [6, 8],
  33: [1, 3], 34: [4, 6], 35: [7, 9], 36: [10, 12],
  37: [1, 4], 38: [5, 8], 39: [9, 12], 40: [1, 6], 41: [7, 12],
};

export function pointBounds(node: PointNode, reading: Reading, field = 'value'): DayBounds {
  const [first, last] = writtenRange(node, reading, field);
  const part = node.type === 'Date' && reading.widen ? qualifiedPart(node) : null;
  const [lo, hi] = part === 'year' || part === 'month' ? widenRange(first, last, part, reading.calendar) : [first, last];
  const [shiftedLo, shiftedHi] = reading.yearStart === 'mar25' ? ladyDayEnvelope(lo, hi, reading.calendar) : [lo, hi];
  const days = part === 'day' ? QUALIFIED_DATE_MARGIN.days : 0;
  return {
    first: julianDayNumber(shiftedLo, reading.calendar) - days,
    last: julianDayNumber(shiftedHi, reading.calendar) + days,
  };
}

/** First and last day the value names, in the calendar it was written in, before any year-start shift. */
function writtenRange(node: PointNode, reading: Reading, field: string): [CalendarDate, CalendarDate] {
  const { calendar } = reading;
  const yearSpan = (from: number, to: number): [CalendarDate, CalendarDate] => [
    { year: from, month: 1, day: 1 },
    { year: to, month: 12, day: 31 },
  ];
  switch (node.type) {
    case 'Year':
      return yearSpan(node.values[0], node.values[0]);
    case 'Decade':
      return yearSpan(node.values[0] * 10, node.values[0] * 10 + 9);
    case 'Century':
      return yearSpan(node.values[0] * 100, node.values[0] * 100 + 99);
    case 'Season': {
      const [year, code] = node.values;
      const [from, to] = SEASON_MONTHS[code];
      const end = monthAt(year, to);
      return [{ ...monthAt(year, from), day: 1 }, { ...end, day: daysInMonth(end.year, end.month, calendar) }];
    }
    case 'Date':
      return hasUnspecifiedDigits(node) ? unspecifiedRange(node, calendar) : specifiedRange(node, reading, field);
  }
}

function specifiedRange(node: { values: number[] }, reading: Reading, field: string): [CalendarDate, CalendarDate] {
  const [year, month0, day] = node.values;
  if (month0 === undefined) return [{ year, month: 1, day: 1 }, { year, month: 12, day: 31 }];
  const month = month0 + 1;
  // Month lengths and leap days belong to the modern year the written date falls in.
  const modernYear = reading.yearStart === 'mar25' && month < 3 ? year + 1 : year;
  if (day === undefined) return [{ year, month, day: 1 }, { year, month, day: daysInMonth(modernYear, month, reading.calendar) }];
  const date = { year, month, day };
  assertValidDate(reading.yearStart === 'mar25' ? modernYearFromLadyDay(date) : date, reading.calendar, field);
  return [date, date];
}

/** 156X-12-25 → 1560-12-25 … 1569-12-25; 1985-XX → the whole year; 2004-06-XX → the whole month. */
function unspecifiedRange(node: PointNode & { type: 'Date' }, calendar: CalendarName): [CalendarDate, CalendarDate] {
  const digits = digitPattern(node);
  const lowYear = Number(digits.year.replace(/X/g, '0'));
  const highYear = Number(digits.year.replace(/X/g, '9'));
  const precision = datePrecision(node);
  const lowMonth = precision === 'year' ? 1 : Math.max(1, Number(digits.month.replace(/X/g, '0')));
  const highMonth = precision === 'year' ? 12 : Math.min(12, Number(digits.month.replace(/X/g, '9')));
  const dayDigits = precision === 'day' ? digits.day : 'XX';
  const lowDay = Math.max(1, Number(dayDigits.replace(/X/g, '0')));
  const highDay = Math.min(daysInMonth(highYear, highMonth, calendar), Number(dayDigits.replace(/X/g, '9')));
  return [{ year: lowYear, month: lowMonth, day: lowDay }, { year: highYear, month: highMonth, day: highDay }];
}

/** Normalise a month count that may run past December or before January. */
function monthAt(year: number, month: number): { year: number; month: number } {
  return { year: year + Math.floor((month - 1) / 12), month: mod(month - 1, 12) + 1 };
}

function clampDay(date: CalendarDate, calendar: CalendarName): CalendarDate {
  return { ...date, day: Math.min(date.day, daysInMonth(date.year, date.month, calendar)) };
}

function widenRange(lo: CalendarDate, hi: CalendarDate, part: 'year' | 'month', calendar: CalendarName): [CalendarDate, CalendarDate] {
  if (part === 'year') {
    const years = QUALIFIED_DATE_MARGIN.years;
    return [clampDay({ ...lo, year: lo.year - years }, calendar), clampDay({ ...hi, year: hi.year + years }, calendar)];
  }
  const months = QUALIFIED_DATE_MARGIN.months;
  const later = monthAt(hi.year, hi.month + months);
  const endsMonth = hi.day === daysInMonth(hi.year, hi.month, calendar);
  return [
    clampDay({ ...lo, ...monthAt(lo.year, lo.month - months) }, calendar),
    endsMonth ? { ...later, day: daysInMonth(later.year, later.month, calendar) } : clampDay({ ...hi, ...later }, calendar),
  ];
}

function before(a: CalendarDate, b: CalendarDate): boolean {
  return a.year !== b.year ? a.year < b.year : a.month !== b.month ? a.month < b.month : a.day < b.day;
}

/**
 * Under a Lady Day year start a written 1 Jan–24 Mar belongs to the next modern year, so
 * the written span [lo, hi] maps to a span whose ends may move: written 1700 is
 * 25 March 1700 – 24 March 1701 in modern numbering.
 */
export function ladyDayEnvelope(lo: CalendarDate, hi: CalendarDate, calendar: CalendarName): [CalendarDate, CalendarDate] {
  const shift = (d: CalendarDate) => (before(d, { year: d.year, month: 3, day: 25 }) ? clampDay({ ...d, year: d.year + 1 }, calendar) : d);
  const ladyDayInLoYear = { year: lo.year, month: 3, day: 25 };
  const eveInHiYear = { year: hi.year, month: 3, day: 24 };
  const first = before(lo, ladyDayInLoYear) && !before(hi, ladyDayInLoYear) ? ladyDayInLoYear : shift(lo);
  const last = !before(hi, { year: hi.year, month: 3, day: 25 }) && !before(eveInHiYear, lo) ? { year: hi.year + 1, month: 3, day: 24 } : shift(hi);
  return [first, last];
}
