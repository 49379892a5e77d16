import {
  dateFromJulianDate, formatIsoDate, julianDate, julianDayNumber, modernYearFromLadyDay, monthName, type CalendarDate, type CalendarName,
} from './calendar';
import { boundsOf, type DayBounds, type YearStart } from './date-bounds';
import {
  datePrecision, digitPattern, hasUnspecifiedDigits, isApproximate, isPoint, isSingleDay, isUncertain, parseEdtf,
  type DateNode, type ParsedEdtf, type PointNode, type SetMember,
} from './edtf-tree';

export { QUALIFIED_DATE_MARGIN, type YearStart } from './date-bounds';

/**
 * Ends used for open intervals ("../1760", "1700/..") so range search has a day to compare:
 * nothing in Windway's field predates the 14th-century recorders, and the ceiling only has
 * to lie beyond any source we will catalogue.
 */
export const OPEN_START_FLOOR = '1300-01-01';
export const OPEN_END_CEILING = '2099-12-31';
const FLOOR_DAY = julianDayNumber({ year: 1300, month: 1, day: 1 }, 'gregorian');
const CEILING_DAY = julianDayNumber({ year: 2099, month: 12, day: 31 }, 'gregorian');

export interface DateDescription {
  edtf: string;
  earliest: string;
  latest: string;
  label: string;
}

export interface ReckonedDate extends DateDescription {
  /** Present for a single day: the day in the Gregorian calendar. */
  gregorian?: string;
  /** Present for a single day: Julian Date at 0h UT of that day (an integer + 0.5, Meeus ch. 7). */
  julianDay?: number;
}

/** Earliest/latest day and a reader's label for an EDTF value written in the Gregorian calendar. */
export function describeEdtf(value: string, field = 'value'): DateDescription {
  const parsed = parseEdtf(value, field);
  const { earliest, latest } = isoBounds(boundsOf(parsed.tree, { calendar: 'gregorian', yearStart: 'jan1', widen: true }, field));
  return { edtf: parsed.canonical, earliest, latest, label: labelOf(parsed) };
}

/**
 * The `GET /api/reckon/date` body. A Julian or Lady-Day value is first turned into a modern
 * Gregorian date (EDTF dates are Gregorian); a single day becomes that day's EDTF, anything
 * wider becomes the EDTF interval of its first and last day (its ~ ? qualifiers are kept in the label).
 */
export function reckonDate(input: { value: string; calendar?: CalendarName; yearStart?: YearStart }, field = 'value'): ReckonedDate {
  const calendar = input.calendar ?? 'gregorian';
  const yearStart = input.yearStart ?? 'jan1';
  const parsed = parseEdtf(input.value, field);
  const reading = { calendar, yearStart, widen: true };
  const { earliest, latest } = isoBounds(boundsOf(parsed.tree, reading, field));
  const converted = calendar !== 'gregorian' || yearStart !== 'jan1';

  if (isSingleDay(parsed.tree)) {
    const [year, month0, day] = parsed.tree.values;
    const written = { year, month: month0 + 1, day };
    const modern = yearStart === 'mar25' ? modernYearFromLadyDay(written) : written;
    const jd = julianDate(modern, calendar);
    const gregorianDate = dateFromJulianDate(jd, 'gregorian');
    const gregorian = formatIsoDate(gregorianDate);
    return {
      edtf: converted ? gregorian + qualifierSuffix(parsed.tree) : parsed.canonical,
      gregorian,
      julianDay: jd,
      earliest,
      latest,
      label: converted ? qualify(dayLabel(gregorianDate), parsed.tree) : labelOf(parsed),
    };
  }
  if (!converted) return { edtf: parsed.canonical, earliest, latest, label: labelOf(parsed) };
  const plain = boundsOf(parsed.tree, { ...reading, widen: false }, field);
  const note = [calendar === 'julian' ? 'Julian calendar' : '', yearStart === 'mar25' ? 'year from 25 March' : ''].filter(Boolean).join(', ');
  return {
    edtf: `${Number.isFinite(plain.first) ? isoDay(plain.first) : '..'}/${Number.isFinite(plain.last) ? isoDay(plain.last) : '..'}`,
    earliest,
    latest,
    label: `${labelOf(parsed)} (${note})`,
  };
}

function isoDay(jdn: number): string {
  return formatIsoDate(dateFromJulianDate(jdn - 0.5, 'gregorian'));
}

/** Open ends fall back to the floor/ceiling, unless the known end lies beyond them. */
function isoBounds({ first, last }: DayBounds): { earliest: string; latest: string } {
  const firstDay = Number.isFinite(first) ? first : Math.min(FLOOR_DAY, last);
  const lastDay = Number.isFinite(last) ? last : Math.max(CEILING_DAY, first);
  return { earliest: isoDay(firstDay), latest: isoDay(lastDay) };
}

function qualifierSuffix(node: DateNode): string {
  const approximate = isApproximate(node);
  const uncertain = isUncertain(node);
  return approximate && uncertain ? '%' : approximate ? '~' : uncertain ? '?' : '';
}

// ---- Labels: "c. 1700", "1700 (uncertain)", "1690s", "1700–1725", "before 1760", "after 1700"

export function labelOf(parsed: ParsedEdtf): string {
  const { tree } = parsed;
  if (tree.type === 'Interval') {
    const [start, end] = tree.values;
    if (!isPoint(start) && !isPoint(end)) return 'undated';
    if (!isPoint(start)) return parsed.unknownStart ? `?–${pointLabel(end as PointNode)}` : `before ${pointLabel(end as PointNode)}`;
    if (!isPoint(end)) return parsed.unknownEnd ? `${pointLabel(start)}–?` : `after ${pointLabel(start)}`;
    return joinRange(pointLabel(start), pointLabel(end));
  }
  switch (tree.type) {
    case 'Set':
    case 'List':
      return setLabel(tree.values, tree.type === 'Set' ? 'or' : 'and', tree);
    default:
      return pointLabel(tree);
  }
}

function setLabel(members: SetMember[], conjunction: 'or' | 'and', flags: { earlier?: boolean; later?: boolean }): string {
  const labels = members.map((m) => (Array.isArray(m) ? joinRange(pointLabel(m[0]), pointLabel(m[1])) : pointLabel(m)));
  if (flags.earlier) labels[0] = `${labels[0]} or earlier`;
  if (flags.later) labels[labels.length - 1] = `${labels[labels.length - 1]} or later`;
  return labels.length < 2 ? labels.join('') : `${labels.slice(0, -1).join(', ')} ${conjunction} ${labels[labels.length - 1]}`;
}

/** En dash, closed up between years; spaced when either side has spaces ("10 May 1700 – 2 June 1701"). */
function joinRange(from: string, to: string): string {
  return from.includes(' ') || to.includes(' ') ? `${from} – ${to}` : `${from}–${to}`;
}

const SEASON_NAMES: Record<number, string> = {
  21: 'spring', 22: 'summer', 23: 'autumn', 24: 'winter',
  25: 'spring', 26: 'summer', 27: 'autumn', 28: 'winter',
  29: 'spring (Southern Hemisphere)', 30: 'summer (Southern Hemisphere)', 31: 'autumn (Southern Hemisphere)', 32: 'winter (Southern Hemisphere)',
  33: 'first quarter of', 34: 'second quarter of', 35: 'third quarter of', 36: 'fourth quarter of',
  37: 'first third of', 38: 'second third of', 39: 'last third of', 40: 'first half of', 41: 'second half of',
};

function pointLabel(node: PointNode): string {
  switch (node.type) {
    case 'Year':
      return `year ${node.values[0]}`;
    case 'Decade':
      return `${node.values[0] * 10}s`;
    case 'Century':
      return `${node.values[0] * 100}s`;
    case 'Season':
      return `${SEASON_NAMES[node.values[1]]} ${node.values[0]}`;
    case 'Date':
      return qualify(hasUnspecifiedDigits(node) ? unspecifiedLabel(node) : specifiedLabel(node), node);
  }
}

function qualify(label: string, node: DateNode): string {
  return `${isApproximate(node) ? 'c. ' : ''}${label}${isUncertain(node) ? ' (uncertain)' : ''}`;
}

function dayLabel(date: CalendarDate): string {
  return `${Math.floor(date.day)} ${monthName(date.month)} ${date.year}`;
}

function specifiedLabel(node: DateNode): string {
  const [year, month0, day] = node.values;
  const precision = datePrecision(node);
  if (precision === 'day') return dayLabel({ year, month: month0 + 1, day });
  if (precision === 'month') return `${monthName(month0 + 1)} ${year}`;
  return String(year);
}

/** 169X → "1690s", 17XX → "1700s", 1985-XX → "1985", 156X-12-25 → "25 December, 1560s". */
function unspecifiedLabel(node: DateNode): string {
  const { year, month, day } = digitPattern(node);
  const trailing = /X+$/.exec(year)?.[0].length ?? 0;
  if (year.slice(0, 4 - trailing).includes('X')) return digitsAsWritten(node);
  const yearLabel = trailing === 0 ? year : `${year.replace(/X/g, '0')}s`;
  const monthKnown = month !== '' && !month.includes('X');
  const dayKnown = day !== '' && !day.includes('X');
  if (month.includes('X') && month !== 'XX') return digitsAsWritten(node);
  if (day.includes('X') && day !== 'XX') return digitsAsWritten(node);
  if (!monthKnown) return yearLabel;
  const monthLabel = monthName(Number(month));
  const inYear = trailing === 0 ? `${monthLabel} ${yearLabel}` : `${monthLabel}, ${yearLabel}`;
  return dayKnown ? `${Number(day)} ${inYear}` : inYear;
}

function digitsAsWritten(node: DateNode): string {
  const { year, month, day } = digitPattern(node);
  return [year, month, day].filter(Boolean).join('-');
}
