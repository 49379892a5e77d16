import { describe, it, expect } from 'vitest';
import edtf from 'edtf';
import { OPEN_END_CEILING, OPEN_START_FLOOR, QUALIFIED_DATE_MARGIN, ReckonerError, describeEdtf, reckonDate } from '@shared/reckoner';
import { errorOf } from './support';

const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

describe('describeEdtf — examples of the LoC EDTF specification', () => {
  it('gives day, year and interval bounds', () => {
    expect(describeEdtf('1985-04-12')).toEqual({ edtf: '1985-04-12', earliest: '1985-04-12', latest: '1985-04-12', label: '12 April 1985' }); // LoC EDTF specification (2019), level 0
    expect(describeEdtf('1964/2008')).toEqual({ edtf: '1964/2008', earliest: '1964-01-01', latest: '2008-12-31', label: '1964–2008' }); // LoC EDTF specification (2019), level 0
    expect(describeEdtf('1700')).toMatchObject({ earliest: '1700-01-01', latest: '1700-12-31', label: '1700' }); // LoC EDTF specification (2019), level 0 — reduced precision
    expect(describeEdtf('1700-02')).toMatchObject({ earliest: '1700-02-01', latest: '1700-02-28', label: 'February 1700' }); // LoC EDTF specification (2019), level 0
  });

  it('reads unspecified digits as decades and centuries', () => {
    expect(describeEdtf('201X')).toMatchObject({ earliest: '2010-01-01', latest: '2019-12-31', label: '2010s' }); // LoC EDTF specification (2019), level 1 — unspecified digits
    expect(describeEdtf('169X')).toMatchObject({ earliest: '1690-01-01', latest: '1699-12-31', label: '1690s' }); // LoC EDTF specification (2019), level 1
    expect(describeEdtf('17XX')).toMatchObject({ earliest: '1700-01-01', latest: '1799-12-31', label: '1700s' }); // LoC EDTF specification (2019), level 1
    expect(describeEdtf('156X-12-25')).toMatchObject({ earliest: '1560-12-25', latest: '1569-12-25', label: '25 December, 1560s' }); // LoC EDTF specification (2019), level 2
    expect(describeEdtf('1985-XX-XX')).toMatchObject({ earliest: '1985-01-01', latest: '1985-12-31' }); // LoC EDTF specification (2019), level 1
  });

  it('labels approximate and uncertain dates and widens them by the documented margin', () => {
    expect(QUALIFIED_DATE_MARGIN).toEqual({ years: 5, months: 1, days: 7 });
    expect(describeEdtf('1700~')).toEqual({ edtf: '1700~', earliest: '1695-01-01', latest: '1705-12-31', label: 'c. 1700' }); // LoC EDTF specification (2019), level 1 — approximate
    expect(describeEdtf('1984?')).toMatchObject({ earliest: '1979-01-01', latest: '1989-12-31', label: '1984 (uncertain)' }); // LoC EDTF specification (2019), level 1 — uncertain
    expect(describeEdtf('2004-06~')).toMatchObject({ earliest: '2004-05-01', latest: '2004-07-31', label: 'c. June 2004' }); // LoC EDTF specification (2019), level 1
    expect(describeEdtf('2004-06-11%')).toMatchObject({ earliest: '2004-06-04', latest: '2004-06-18', label: 'c. 11 June 2004 (uncertain)' }); // LoC EDTF specification (2019), level 1 — % is both
    expect(describeEdtf('2004?-06-11')).toMatchObject({ earliest: '1999-06-11', latest: '2009-06-11' }); // LoC EDTF specification (2019), level 2 — qualified year only
  });

  it('labels open intervals "before" and "after", bounded by the documented floor and ceiling', () => {
    expect(describeEdtf('../1985-04-12')).toMatchObject({ earliest: OPEN_START_FLOOR, latest: '1985-04-12', label: 'before 12 April 1985' }); // LoC EDTF specification (2019), level 1 — open start
    expect(describeEdtf('../1760')).toMatchObject({ earliest: '1300-01-01', latest: '1760-12-31', label: 'before 1760' }); // LoC EDTF specification (2019), level 1
    expect(describeEdtf('1700/..')).toMatchObject({ earliest: '1700-01-01', latest: OPEN_END_CEILING, label: 'after 1700' }); // LoC EDTF specification (2019), level 1 — open end
    expect(describeEdtf('1700/')).toMatchObject({ earliest: '1700-01-01', latest: '2099-12-31', label: '1700–?' }); // LoC EDTF specification (2019), level 1 — unknown end
    expect(describeEdtf('/1760')).toMatchObject({ earliest: '1300-01-01', label: '?–1760' }); // LoC EDTF specification (2019), level 1 — unknown start
    expect(describeEdtf('../1200').earliest).toBe('1200-12-31'); // a known end before the floor wins
  });

  it('reads sets as "one of" and lists as "all of", with the right bounds', () => {
    expect(describeEdtf('[1667,1668,1670..1672]')).toEqual({ edtf: '[1667,1668,1670..1672]', earliest: '1667-01-01', latest: '1672-12-31', label: '1667, 1668 or 1670–1672' }); // LoC EDTF specification (2019), level 2 — one of a set
    expect(describeEdtf('{1667,1668,1670..1672}')).toMatchObject({ earliest: '1667-01-01', latest: '1672-12-31', label: '1667, 1668 and 1670–1672' }); // LoC EDTF specification (2019), level 2 — all members
    expect(describeEdtf('[1850..1860]')).toMatchObject({ earliest: '1850-01-01', latest: '1860-12-31', label: '1850–1860' }); // stack.md — edtf trap case
    expect(describeEdtf('[..1760]')).toMatchObject({ earliest: '1300-01-01', latest: '1760-12-31', label: '1760 or earlier' }); // LoC EDTF specification (2019), level 2
    expect(describeEdtf('[1760..]')).toMatchObject({ earliest: '1760-01-01', latest: '2099-12-31', label: '1760 or later' }); // LoC EDTF specification (2019), level 2
  });

  it('reads seasons as meteorological months in the Northern Hemisphere', () => {
    expect(describeEdtf('2001-21')).toMatchObject({ earliest: '2001-03-01', latest: '2001-05-31', label: 'spring 2001' }); // LoC EDTF specification (2019), level 1 — 21 = spring; months our convention
    expect(describeEdtf('2001-24')).toMatchObject({ earliest: '2001-12-01', latest: '2002-02-28', label: 'winter 2001' }); // LoC EDTF specification (2019), level 1 — 24 = winter
    expect(describeEdtf('2001-33')).toMatchObject({ earliest: '2001-01-01', latest: '2001-03-31', label: 'first quarter of 2001' }); // LoC EDTF specification (2019), level 2 — 33 = quarter 1
  });

  it('labels qualified interval ends and spaces the dash between full dates', () => {
    expect(describeEdtf('1700?/1725~')).toMatchObject({ earliest: '1695-01-01', latest: '1730-12-31', label: '1700 (uncertain) – c. 1725' }); // LoC EDTF specification (2019), level 1
    expect(describeEdtf('1700-05-10/1701-06-02').label).toBe('10 May 1700 – 2 June 1701');
  });

  it('refuses what is not EDTF, saying which forms are accepted', () => {
    const error = errorOf(() => describeEdtf('about 1700'));
    expect(error.field).toBe('value');
    expect(error.message).toMatch(/1700~.*1700\/1725/);
    expect(() => describeEdtf('')).toThrow(ReckonerError);
    expect(errorOf(() => describeEdtf('1725/1700')).message).toMatch(/ends before it begins/);
  });
});

describe('edtf 4.11 traps, and the wrapper’s answer to each', () => {
  it('trap: an open end reports max 1970-01-01', () => {
    expect(isoDay(edtf('1985/').max)).toBe('1970-01-01'); // stack.md "edtf 4.11 traps" — documents the library bug
    expect(describeEdtf('1985/').latest).toBe(OPEN_END_CEILING);
  });

  it('trap: the max of a set is that of its first year', () => {
    expect(isoDay(edtf('[1850..1860]').max)).toBe('1850-12-31'); // stack.md "edtf 4.11 traps"
    expect(isoDay(edtf('[1667,1668,1670..1672]').max)).toBe('1670-12-31'); // references.md — "the max of some sets is wrong"
    expect(describeEdtf('[1850..1860]').latest).toBe('1860-12-31');
  });

  it('trap: approximate and uncertain forms are not widened', () => {
    expect(isoDay(edtf('1700~').min)).toBe('1700-01-01'); // references.md — edtf 4.11 does not widen
    expect(describeEdtf('1700~').earliest).toBe('1695-01-01');
  });

  it('trap: 1700-02-29 is silently moved to 1 March; we refuse it in the Gregorian calendar', () => {
    expect(edtf('1700-02-29').toEDTF()).toBe('1700-03-01'); // stack.md "edtf 4.11 traps"
    expect(errorOf(() => describeEdtf('1700-02-29')).message).toMatch(/1700-02-29 does not exist.*Gregorian/); // Calendar (New Style) Act 1750 — 1700 not a leap year New Style
    expect(() => describeEdtf('1700-02-29/1700-03-05')).toThrow(ReckonerError);
    expect(describeEdtf('1600-02-29').earliest).toBe('1600-02-29'); // Inter gravissimas (1582) — 1600 is a leap year (from memory)
  });
});

describe('reckonDate (GET /api/reckon/date)', () => {
  it('answers a Gregorian single day with its Julian Date at 0h', () => {
    expect(reckonDate({ value: '1957-10-04' })).toEqual({
      edtf: '1957-10-04', gregorian: '1957-10-04', julianDay: 2436115.5, earliest: '1957-10-04', latest: '1957-10-04', label: '4 October 1957',
    }); // Meeus, Astronomical Algorithms 2nd ed., ch. 7, example 7.a at 0h (2436116.31 − 0.81)
    expect(reckonDate({ value: '2000-01-01', calendar: 'gregorian', yearStart: 'jan1' }).julianDay).toBe(2451544.5); // Meeus 2nd ed., p. 62 table, 2000 Jan 1.5 = 2451545.0 (from memory)
  });

  it('leaves wider values without a single day', () => {
    const result = reckonDate({ value: '1700~' });
    expect(result).toEqual({ edtf: '1700~', earliest: '1695-01-01', latest: '1705-12-31', label: 'c. 1700' });
    expect(result).not.toHaveProperty('julianDay');
  });

  it('converts a Julian day to Gregorian before making EDTF', () => {
    expect(reckonDate({ value: '1752-09-02', calendar: 'julian' })).toMatchObject({ edtf: '1752-09-13', gregorian: '1752-09-13', label: '13 September 1752' }); // Calendar (New Style) Act 1750
    expect(reckonDate({ value: '1752-09-03', calendar: 'julian' }).gregorian).toBe('1752-09-14'); // Calendar (New Style) Act 1750
    expect(reckonDate({ value: '1752-09-03', calendar: 'julian' }).julianDay).toBe(reckonDate({ value: '1752-09-14' }).julianDay);
    expect(reckonDate({ value: '333-01-27'.padStart(10, '0'), calendar: 'julian' }).julianDay).toBe(1842712.5); // Meeus, Astronomical Algorithms 2nd ed., ch. 7, example 7.b at 0h (1842713.0 − 0.5)
  });

  it('accepts the Julian-only leap day 29 February 1700 and converts it', () => {
    expect(reckonDate({ value: '1700-02-29', calendar: 'julian' })).toMatchObject({ gregorian: '1700-03-11', earliest: '1700-03-11', latest: '1700-03-11' }); // Calendar (New Style) Act 1750 — 11 days from 29 Feb 1700
    expect(reckonDate({ value: '1700-02-28', calendar: 'julian' }).gregorian).toBe('1700-03-10'); // Calendar (New Style) Act 1750 — 10 days through 28 Feb 1700
  });

  it('reads a Lady-Day year: 1700-02-10 is 10 February 1701', () => {
    expect(reckonDate({ value: '1700-02-10', yearStart: 'mar25' })).toMatchObject({ edtf: '1701-02-10', gregorian: '1701-02-10', label: '10 February 1701' }); // product.md /api/reckon/date; Calendar (New Style) Act 1750
    expect(reckonDate({ value: '1700-03-25', yearStart: 'mar25' }).gregorian).toBe('1700-03-25'); // Calendar (New Style) Act 1750 — year began on Lady Day
  });

  it('applies the Lady-Day year before the Julian conversion', () => {
    expect(reckonDate({ value: '1700-02-10', calendar: 'julian', yearStart: 'mar25' }).gregorian).toBe('1701-02-21'); // Calendar (New Style) Act 1750 — 1701 N.S., 11 days
    expect(reckonDate({ value: '1699-02-29', calendar: 'julian', yearStart: 'mar25' }).gregorian).toBe('1700-03-11'); // written 29 Feb 1699/1700 is Julian 29 Feb 1700
    expect(() => reckonDate({ value: '1700-02-29', calendar: 'julian', yearStart: 'mar25' })).toThrow(/1701-02-29 does not exist/);
  });

  it('keeps qualifiers on a converted day', () => {
    expect(reckonDate({ value: '1700-02-10~', calendar: 'julian' })).toMatchObject({ edtf: '1700-02-20~', label: 'c. 20 February 1700', earliest: '1700-02-13', latest: '1700-02-27' }); // Calendar (New Style) Act 1750 — 10 days before 29 Feb 1700
    expect(reckonDate({ value: '2004-~06-11' })).toMatchObject({ earliest: '2004-05-11', latest: '2004-07-11' }); // LoC EDTF specification (2019), level 2 — month alone qualified
    expect(reckonDate({ value: '2004-06~-11' })).toMatchObject({ earliest: '1999-06-11', latest: '2009-06-11' }); // LoC EDTF specification (2019), level 2 — qualifier reaches year and month
  });

  it('turns a converted year or interval into the interval of its first and last day', () => {
    expect(reckonDate({ value: '1700', yearStart: 'mar25' })).toEqual({ edtf: '1700-03-25/1701-03-24', earliest: '1700-03-25', latest: '1701-03-24', label: '1700 (year from 25 March)' }); // Calendar (New Style) Act 1750
    expect(reckonDate({ value: '1700', calendar: 'julian' })).toMatchObject({ edtf: '1700-01-11/1701-01-11', earliest: '1700-01-11', latest: '1701-01-11' }); // Calendar (New Style) Act 1750 — 10, then 11 days
    expect(reckonDate({ value: '../1760', calendar: 'julian' })).toMatchObject({ edtf: '../1761-01-11', label: 'before 1760 (Julian calendar)' });
  });

  it('refuses a Gregorian 29 February 1700 through the API function too', () => {
    const error = errorOf(() => reckonDate({ value: '1700-02-29' }));
    expect(error.field).toBe('value');
  });
});
