const MONTHS = ['january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september', 'october', 'november', 'december'];

function monthNumber(word: string): number | undefined {
  const w = word.toLowerCase().replace(/\.$/, '');
  if (w.length < 3) return undefined;
  const index = MONTHS.findIndex((m) => m.startsWith(w));
  return index >= 0 ? index + 1 : undefined;
}

/**
 * A day as a person writes it — "10 February 1700", "10 Feb. 1700", "February 10, 1700" — as
 * the EDTF day the reckoner reads ("1700-02-10"); undefined when the text is not such a day,
 * so EDTF values pass through untouched.
 */
export function writtenDayToEdtf(text: string): string | undefined {
  const trimmed = text.trim();
  const dayFirst = /^(\d{1,2})(?:st|nd|rd|th)?\s+([a-z]+\.?)\s+(\d{3,4})$/i.exec(trimmed);
  const monthFirst = /^([a-z]+\.?)\s+(\d{1,2})(?:st|nd|rd|th)?,?\s+(\d{3,4})$/i.exec(trimmed);
  const [day, monthWord, year] = dayFirst
    ? [dayFirst[1], dayFirst[2], dayFirst[3]]
    : monthFirst
      ? [monthFirst[2], monthFirst[1], monthFirst[3]]
      : [];
  const month = monthWord ? monthNumber(monthWord) : undefined;
  if (!day || !year || !month) return undefined;
  return `${year.padStart(4, '0')}-${String(month).padStart(2, '0')}-${day.padStart(2, '0')}`;
}
