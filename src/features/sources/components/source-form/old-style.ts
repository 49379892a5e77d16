import {
  ReckonerError,
  formatIsoDate,
  julianToGregorian,
  monthName,
  parseDualDate,
  reckonDate,
  type CalendarDate,
} from '@shared/reckoner';

export interface OldStyleReading {
  /** Written as the source wrote it. */
  julian: boolean;
  /** The writer's year began on 25 March (Lady Day). */
  ladyDay: boolean;
}

export interface OldStyleResult {
  edtf: string;
  label: string;
  explanation: string;
}

function dayLabel(date: CalendarDate): string {
  return `${Math.floor(date.day)} ${monthName(date.month)} ${date.year}`;
}

/** "10 February 1700" or "10 Feb. 1700" → "1700-02-10"; null when it is not that shape. */
function dayMonthYear(text: string): string | null {
  const match = /^\s*(\d{1,2})\s+([a-z]{3,})\.?\s+(\d{3,4})\s*$/i.exec(text);
  if (!match) return null;
  const word = match[2].toLowerCase();
  const month = Array.from({ length: 12 }, (_, i) => i + 1).find((m) => monthName(m).toLowerCase().startsWith(word));
  if (!month) return null;
  return formatIsoDate({ year: Number(match[3]), month, day: Number(match[1]) });
}

/**
 * Turn a date as an Old Style source wrote it into a modern (Gregorian, 1 January) EDTF date.
 * Accepts double dates ("10 February 1700/01"), day–month–year ("10 February 1700") and EDTF.
 * Throws ReckonerError with a message fit to show beside the input.
 */
export function convertOldStyle(text: string, reading: OldStyleReading): OldStyleResult {
  const value = text.trim();
  if (!value) throw new ReckonerError('written', 'Type the date as the source writes it, e.g. 10 February 1700/01.');

  if (/\d\s*\/\s*\d{1,4}\s*$/.test(value) && /[a-z.]/i.test(value)) {
    const dual = parseDualDate(value, 'written');
    const modern = reading.julian ? julianToGregorian(dual.modern, 'written') : dual.modern;
    const steps = [`${value} is ${dayLabel(dual.modern)} with the year counted from 1 January`];
    if (reading.julian) steps.push(`in the Gregorian calendar that day is ${dayLabel(modern)}`);
    return { edtf: formatIsoDate(modern), label: dayLabel(modern), explanation: `${steps.join('; ')}.` };
  }

  const iso = dayMonthYear(value) ?? value;
  const reckoned = reckonDate({ value: iso, calendar: reading.julian ? 'julian' : 'gregorian', yearStart: reading.ladyDay ? 'mar25' : 'jan1' }, 'written');
  const how = [reading.julian ? 'Julian calendar' : '', reading.ladyDay ? 'year beginning 25 March' : ''].filter(Boolean).join(', ');
  return {
    edtf: reckoned.edtf,
    label: reckoned.label,
    explanation: how ? `Read as written under the ${how}: ${reckoned.label} in modern reckoning.` : `${reckoned.label}; no conversion needed.`,
  };
}
