import { ReckonerError } from './errors';

/**
 * Calendar arithmetic after Meeus, Astronomical Algorithms (2nd ed., 1998), ch. 7.
 * Both calendars are proleptic: Gregorian dates before 1582 and Julian dates after
 * 1752 are computed by the same rules, which is what converting old sources needs.
 */
export type CalendarName = 'gregorian' | 'julian';

export interface CalendarDate {
  year: number;
  /** 1–12 */
  month: number;
  /** 1–31; may carry a day fraction for Meeus's examples (4.81 = 19h26m). */
  day: number;
}

const MONTH_LENGTHS = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

export function isLeapYear(year: number, calendar: CalendarName): boolean {
  if (calendar === 'julian') return year % 4 === 0;
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export function daysInMonth(year: number, month: number, calendar: CalendarName): number {
  return month === 2 && isLeapYear(year, calendar) ? 29 : MONTH_LENGTHS[month - 1];
}

/** Throw unless the day exists in that calendar (1700-02-29 exists in the Julian calendar only). */
export function assertValidDate(date: CalendarDate, calendar: CalendarName, field = 'value'): void {
  const { year, month } = date;
  const day = Math.floor(date.day);
  if (!Number.isInteger(year) || !Number.isInteger(month) || month < 1 || month > 12) {
    throw new ReckonerError(field, `${formatIsoDate(date)} has no month ${month}.`);
  }
  if (day < 1 || day > daysInMonth(year, month, calendar)) {
    const why = month === 2 && day === 29 ? `${year} is not a leap year in the ${calendar === 'julian' ? 'Julian' : 'Gregorian'} calendar` : `that month has ${daysInMonth(year, month, calendar)} days`;
    throw new ReckonerError(field, `${formatIsoDate(date)} does not exist: ${why}.`);
  }
}

/**
 * Julian Date (Meeus ch. 7): JD of 0h UT on a civil date is an integer + 0.5
 * (1957-10-04 at 0h = 2436115.5); a fractional day gives the moment within it.
 */
export function julianDate(date: CalendarDate, calendar: CalendarName): number {
  let { year, month } = date;
  if (month <= 2) {
    year -= 1;
    month += 12;
  }
  const century = Math.floor(year / 100);
  const gregorianCorrection = calendar === 'gregorian' ? 2 - century + Math.floor(century / 4) : 0;
  return Math.floor(365.25 * (year + 4716)) + Math.floor(30.6001 * (month + 1)) + date.day + gregorianCorrection - 1524.5;
}

/** Civil date of a Julian Date in the chosen calendar (Meeus ch. 7, inverse; valid for JD ≥ 0). */
export function dateFromJulianDate(jd: number, calendar: CalendarName): CalendarDate {
  const shifted = jd + 0.5;
  const whole = Math.floor(shifted);
  const fraction = shifted - whole;
  let a = whole;
  if (calendar === 'gregorian') {
    const alpha = Math.floor((whole - 1867216.25) / 36524.25);
    a = whole + 1 + alpha - Math.floor(alpha / 4);
  }
  const b = a + 1524;
  const c = Math.floor((b - 122.1) / 365.25);
  const d = Math.floor(365.25 * c);
  const e = Math.floor((b - d) / 30.6001);
  const day = b - d - Math.floor(30.6001 * e) + fraction;
  const month = e < 14 ? e - 1 : e - 13;
  const year = month > 2 ? c - 4716 : c - 4715;
  return { year, month, day };
}

/** Chronological Julian Day Number: the integer day count, JD at 0h + 0.5. */
export function julianDayNumber(date: CalendarDate, calendar: CalendarName): number {
  return Math.floor(julianDate({ ...date, day: Math.floor(date.day) }, calendar) + 0.5);
}

export function julianToGregorian(date: CalendarDate, field = 'value'): CalendarDate {
  assertValidDate(date, 'julian', field);
  return dateFromJulianDate(julianDate(date, 'julian'), 'gregorian');
}

export function gregorianToJulian(date: CalendarDate, field = 'value'): CalendarDate {
  assertValidDate(date, 'gregorian', field);
  return dateFromJulianDate(julianDate(date, 'gregorian'), 'julian');
}

/**
 * Days the Gregorian calendar runs ahead of the Julian on a Julian date: 10 through
 * 28 Feb 1700, 11 from the Julian-only leap day 29 Feb 1700 (Calendar (New Style) Act 1750).
 */
export function julianGregorianDifference(julian: CalendarDate): number {
  assertValidDate(julian, 'julian');
  const sameLabels = julian.month === 2 && Math.floor(julian.day) === 29 && !isLeapYear(julian.year, 'gregorian')
    ? { ...julian, month: 3, day: 1 }
    : julian;
  return julianDate(sameLabels, 'julian') - julianDate(sameLabels, 'gregorian');
}

/**
 * Lady Day year start (England before 1752, Calendar (New Style) Act 1750): a date written
 * between 1 January and 24 March belongs to the following year in modern numbering.
 */
export function modernYearFromLadyDay(written: CalendarDate): CalendarDate {
  const beforeLadyDay = written.month < 3 || (written.month === 3 && written.day < 25);
  return beforeLadyDay ? { ...written, year: written.year + 1 } : written;
}

const MONTH_NAMES = ['january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september', 'october', 'november', 'december'];
const ROMAN_MONTHS = ['i', 'ii', 'iii', 'iv', 'v', 'vi', 'vii', 'viii', 'ix', 'x', 'xi', 'xii'];

function monthFromWord(word: string): number | undefined {
  const w = word.toLowerCase().replace(/\.$/, '');
  const roman = ROMAN_MONTHS.indexOf(w);
  if (roman >= 0) return roman + 1;
  const named = MONTH_NAMES.findIndex((m) => w.length >= 3 && m.startsWith(w));
  return named >= 0 ? named + 1 : undefined;
}

export interface DualDate {
  /** The year as the Old Style (Lady Day) writer numbered it. */
  writtenYear: number;
  /** The same day in modern (1 January) year numbering; still in the source's calendar. */
  modern: CalendarDate;
}

/**
 * Parse a double-dated day: "10 February 1700/01", "10 Feb 1700/1", "10.ii.1700/01".
 * The second year must be the first plus one; it is the modern year.
 */
export function parseDualDate(text: string, field = 'value'): DualDate {
  const match = /^\s*(\d{1,2})(?:\s+|\.)([a-z]+\.?|[ivx]+)(?:\s+|\.)(\d{3,4})\s*\/\s*(\d{1,4})\s*$/i.exec(text);
  const month = match ? monthFromWord(match[2]) : undefined;
  if (!match || !month) {
    throw new ReckonerError(field, `"${text.trim()}" is not a double date: write e.g. "10 February 1700/01", "10 Feb 1700/1" or "10.ii.1700/01".`);
  }
  const writtenYear = Number(match[3]);
  const modernYear = writtenYear + 1;
  if (!String(modernYear).endsWith(match[4])) {
    throw new ReckonerError(field, `In "${text.trim()}" the second year should follow the first (${writtenYear}/${String(modernYear).slice(-2)}).`);
  }
  const modern = { year: modernYear, month, day: Number(match[1]) };
  if (modern.month > 3 || (modern.month === 3 && modern.day >= 25)) {
    throw new ReckonerError(field, `Double years are written only from 1 January to 24 March; ${match[1]} ${MONTH_NAMES[month - 1]} has a single year.`);
  }
  return { writtenYear, modern };
}

/** ISO 8601 calendar date; years outside 0–9999 carry a sign and six digits, as ISO expanded years do. */
export function formatIsoDate({ year, month, day }: CalendarDate): string {
  const yyyy = year >= 0 && year <= 9999 ? String(year).padStart(4, '0') : `${year < 0 ? '-' : '+'}${String(Math.abs(year)).padStart(6, '0')}`;
  return `${yyyy}-${String(month).padStart(2, '0')}-${String(Math.floor(day)).padStart(2, '0')}`;
}

export function monthName(month: number): string {
  const name = MONTH_NAMES[month - 1];
  return name.charAt(0).toUpperCase() + name.slice(1);
}
