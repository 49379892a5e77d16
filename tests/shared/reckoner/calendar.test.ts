import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  ReckonerError, assertValidDate, dateFromJulianDate, daysInMonth, gregorianToJulian, isLeapYear, julianDate,
  julianDayNumber, julianGregorianDifference, julianToGregorian, modernYearFromLadyDay, parseDualDate,
  type CalendarName,
} from '@shared/reckoner';
import { errorOf } from './support';

describe('julianDate (Meeus ch. 7)', () => {
  it('computes Meeus’s worked examples', () => {
    expect(julianDate({ year: 1957, month: 10, day: 4.81 }, 'gregorian')).toBeCloseTo(2436116.31, 6); // Meeus, Astronomical Algorithms 2nd ed., ch. 7, example 7.a
    expect(julianDate({ year: 333, month: 1, day: 27.5 }, 'julian')).toBe(1842713.0); // Meeus, Astronomical Algorithms 2nd ed., ch. 7, example 7.b
  });

  const table: Array<[number, number, number, CalendarName, number]> = [
    [2000, 1, 1.5, 'gregorian', 2451545.0], // Meeus 2nd ed., p. 62 table, row 2000 Jan 1.5 (from memory; J2000.0)
    [1999, 1, 1.0, 'gregorian', 2451179.5], // Meeus 2nd ed., p. 62 table, row 1999 Jan 1.0 (from memory)
    [1987, 1, 27.0, 'gregorian', 2446822.5], // Meeus 2nd ed., p. 62 table, row 1987 Jan 27.0 (from memory)
    [1987, 6, 19.5, 'gregorian', 2446966.0], // Meeus 2nd ed., p. 62 table, row 1987 June 19.5 (from memory)
    [1988, 1, 27.0, 'gregorian', 2447187.5], // Meeus 2nd ed., p. 62 table, row 1988 Jan 27.0 (from memory)
    [1988, 6, 19.5, 'gregorian', 2447332.0], // Meeus 2nd ed., p. 62 table, row 1988 June 19.5 (from memory)
    [1900, 1, 1.0, 'gregorian', 2415020.5], // Meeus 2nd ed., p. 62 table, row 1900 Jan 1.0 (from memory)
    [1600, 1, 1.0, 'gregorian', 2305447.5], // Meeus 2nd ed., p. 62 table, row 1600 Jan 1.0 (from memory)
    [1600, 12, 31.0, 'gregorian', 2305812.5], // Meeus 2nd ed., p. 62 table, row 1600 Dec 31.0 (from memory)
    [837, 4, 10.3, 'julian', 2026871.8], // Meeus 2nd ed., p. 62 table, row 837 Apr 10.3 (from memory)
    [-123, 12, 31.0, 'julian', 1676496.5], // Meeus 2nd ed., p. 62 table, row −123 Dec 31.0 (from memory)
    [-122, 1, 1.0, 'julian', 1676497.5], // Meeus 2nd ed., p. 62 table, row −122 Jan 1.0 (from memory)
    [-1000, 7, 12.5, 'julian', 1356001.0], // Meeus 2nd ed., p. 62 table, row −1000 July 12.5 (from memory)
    [-1000, 2, 29.0, 'julian', 1355866.5], // Meeus 2nd ed., p. 62 table, row −1000 Feb 29.0 (from memory)
    [-1001, 8, 17.9, 'julian', 1355671.4], // Meeus 2nd ed., p. 62 table, row −1001 Aug 17.9 (from memory)
    [-4712, 1, 1.5, 'julian', 0.0], // Meeus 2nd ed., p. 62 table, row −4712 Jan 1.5 (from memory; the JD epoch)
  ];

  it.each(table)('%i-%i-%f (%s) → JD %f', (year, month, day, calendar, jd) => {
    expect(julianDate({ year, month, day }, calendar)).toBeCloseTo(jd, 6);
    const back = dateFromJulianDate(jd, calendar);
    expect(back.year).toBe(year);
    expect(back.month).toBe(month);
    expect(back.day).toBeCloseTo(day, 6);
  });

  it('inverts example 7.a', () => {
    const date = dateFromJulianDate(2436116.31, 'gregorian');
    expect(date).toMatchObject({ year: 1957, month: 10 }); // Meeus, Astronomical Algorithms 2nd ed., ch. 7, example 7.c (from memory: inverse of 7.a)
    expect(date.day).toBeCloseTo(4.81, 6);
  });

  it('counts whole days as Chronological JDN = JD at 0h + 0.5', () => {
    expect(julianDayNumber({ year: 1957, month: 10, day: 4 }, 'gregorian')).toBe(2436116); // Meeus 7.a at 0h is 2436115.5
    expect(julianDayNumber({ year: 2000, month: 1, day: 1 }, 'gregorian')).toBe(2451545); // Meeus p. 62, J2000.0 (from memory)
  });
});

describe('Julian ↔ Gregorian', () => {
  it('differs by 10 days through 28 February 1700 (Julian) and 11 days from 29 February 1700', () => {
    expect(julianGregorianDifference({ year: 1700, month: 2, day: 28 })).toBe(10); // Calendar (New Style) Act 1750, as summarised in references.md
    expect(julianToGregorian({ year: 1700, month: 2, day: 28 })).toEqual({ year: 1700, month: 3, day: 10 }); // Calendar (New Style) Act 1750 — 10 days
    expect(julianGregorianDifference({ year: 1700, month: 2, day: 29 })).toBe(11); // Calendar (New Style) Act 1750 — 11 days from 29 Feb 1700
    expect(julianToGregorian({ year: 1700, month: 2, day: 29 })).toEqual({ year: 1700, month: 3, day: 11 }); // Calendar (New Style) Act 1750
    expect(julianToGregorian({ year: 1700, month: 3, day: 1 })).toEqual({ year: 1700, month: 3, day: 12 }); // Calendar (New Style) Act 1750
    expect(julianGregorianDifference({ year: 1600, month: 6, day: 1 })).toBe(10); // Calendar (New Style) Act 1750 (10 days in the 17th century)
    expect(julianGregorianDifference({ year: 1799, month: 12, day: 31 })).toBe(11); // Calendar (New Style) Act 1750 — 11 days until 1800
  });

  it('joins Wednesday 2 September 1752 to Thursday 14 September 1752', () => {
    expect(julianToGregorian({ year: 1752, month: 9, day: 2 })).toEqual({ year: 1752, month: 9, day: 13 }); // Calendar (New Style) Act 1750
    expect(julianToGregorian({ year: 1752, month: 9, day: 3 })).toEqual({ year: 1752, month: 9, day: 14 }); // Calendar (New Style) Act 1750
    const wednesday = julianDayNumber({ year: 1752, month: 9, day: 2 }, 'julian');
    expect(julianDayNumber({ year: 1752, month: 9, day: 14 }, 'gregorian')).toBe(wednesday + 1); // Calendar (New Style) Act 1750 — the next day
    expect((wednesday + 1) % 7).toBe(3); // Meeus ch. 7 — day of week = (JD at 0h + 1.5) mod 7, 0 = Sunday, 3 = Wednesday (from memory)
    expect((wednesday + 2) % 7).toBe(4); // Meeus ch. 7 — 4 = Thursday; Calendar (New Style) Act 1750
  });

  it('starts the Gregorian calendar on 15 October 1582', () => {
    expect(julianToGregorian({ year: 1582, month: 10, day: 4 })).toEqual({ year: 1582, month: 10, day: 14 }); // Inter gravissimas (1582) — 4 Oct followed by 15 Oct (from memory)
    expect(gregorianToJulian({ year: 1582, month: 10, day: 15 })).toEqual({ year: 1582, month: 10, day: 5 }); // Inter gravissimas (1582)
  });

  it('round-trips Julian → Gregorian → Julian over 1500–1900', () => {
    const julianDay = fc
      .record({ year: fc.integer({ min: 1500, max: 1900 }), month: fc.integer({ min: 1, max: 12 }), day: fc.integer({ min: 1, max: 31 }) })
      .map((d) => ({ ...d, day: Math.min(d.day, daysInMonth(d.year, d.month, 'julian')) }));
    fc.assert(fc.property(julianDay, (date) => {
      const back = gregorianToJulian(julianToGregorian(date));
      return back.year === date.year && back.month === date.month && back.day === date.day;
    }));
  });

  it('refuses days that do not exist in the given calendar', () => {
    expect(() => julianToGregorian({ year: 1701, month: 2, day: 29 })).toThrow(ReckonerError);
    expect(errorOf(() => gregorianToJulian({ year: 1700, month: 2, day: 29 })).message).toMatch(/not a leap year in the Gregorian/);
    expect(() => assertValidDate({ year: 1700, month: 4, day: 31 }, 'gregorian')).toThrow(/30 days/);
    expect(() => assertValidDate({ year: 1700, month: 13, day: 1 }, 'gregorian')).toThrow(ReckonerError);
  });

  it('applies each calendar’s leap rule', () => {
    expect(isLeapYear(1700, 'julian')).toBe(true); // Calendar (New Style) Act 1750 — 1700 leap in Old Style only
    expect(isLeapYear(1700, 'gregorian')).toBe(false); // Calendar (New Style) Act 1750
    expect(isLeapYear(1600, 'gregorian')).toBe(true); // Inter gravissimas (1582) — centuries divisible by 400 (from memory)
  });
});

describe('Lady Day year start', () => {
  it('moves 1 January–24 March into the next modern year', () => {
    expect(modernYearFromLadyDay({ year: 1700, month: 2, day: 10 })).toEqual({ year: 1701, month: 2, day: 10 }); // Calendar (New Style) Act 1750 — year began 25 March
    expect(modernYearFromLadyDay({ year: 1700, month: 3, day: 24 })).toEqual({ year: 1701, month: 3, day: 24 }); // Calendar (New Style) Act 1750
    expect(modernYearFromLadyDay({ year: 1700, month: 3, day: 25 })).toEqual({ year: 1700, month: 3, day: 25 }); // Calendar (New Style) Act 1750
    expect(modernYearFromLadyDay({ year: 1700, month: 12, day: 31 })).toEqual({ year: 1700, month: 12, day: 31 });
  });

  it('parses double dates', () => {
    expect(parseDualDate('10 February 1700/01')).toEqual({ writtenYear: 1700, modern: { year: 1701, month: 2, day: 10 } }); // Calendar (New Style) Act 1750 — dual dating
    expect(parseDualDate('10 Feb 1700/1').modern).toEqual({ year: 1701, month: 2, day: 10 });
    expect(parseDualDate('10 Feb. 1700/1').modern).toEqual({ year: 1701, month: 2, day: 10 });
    expect(parseDualDate('10.ii.1700/01').modern).toEqual({ year: 1701, month: 2, day: 10 });
    expect(parseDualDate('24 March 1699/1700').modern).toEqual({ year: 1700, month: 3, day: 24 });
  });

  it('refuses malformed double dates', () => {
    expect(errorOf(() => parseDualDate('10 February 1700/02')).message).toMatch(/1700\/01/);
    expect(errorOf(() => parseDualDate('10 June 1700/01')).message).toMatch(/1 January to 24 March/);
    expect(errorOf(() => parseDualDate('1700-02-10')).message).toMatch(/10 February 1700\/01/);
    expect(() => parseDualDate('10 Fibruary 1700/01')).toThrow(ReckonerError);
  });
});
