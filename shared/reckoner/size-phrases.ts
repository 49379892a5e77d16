import { ReckonerError } from './errors';
import { SPOKEN_INTERVAL_FORMS, parseSpokenInterval } from './intervals';
import { midiToNote } from './notes';
import { INSTRUMENT_SIZES, nominalNote, type InstrumentSize } from './sizes';

export interface ResolvedSize {
  size: InstrumentSize;
  reference: InstrumentSize;
  /** Signed semitones from the reference's lowest note to the size's. */
  semitones: number;
}

const DIRECTIONS: ReadonlyArray<[RegExp, 1 | -1]> = [
  [/\s+(?:below|lower than|under|beneath)\s+/, -1],
  [/\s+(?:above|higher than|over)\s+/, 1],
];

const ACCEPTED_FORMS =
  'write "<interval> <direction> <size>", e.g. "a fourth below the alto", "a tone and a half lower than the treble", "a tone above the tenor"; ' +
  `intervals: ${SPOKEN_INTERVAL_FORMS}; directions: below, lower than, under, above, higher than`;

/** Lower-case, strip accents and hyphens, so "Flûte de voix" and "flute-de-voix" match. */
export function normalizeTerm(text: string): string {
  return text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase().replace(/[-_]/g, ' ').replace(/\s+/g, ' ').trim();
}

/** Find a size by slug, name or any other name ("treble" → alto, "descant" → soprano). */
export function findSizeByName(text: string): InstrumentSize | undefined {
  const wanted = normalizeTerm(text).replace(/^the /, '');
  const matches = (candidate: string) => {
    for (const size of INSTRUMENT_SIZES) {
      const terms = [size.slug, size.name, ...size.otherNames].map(normalizeTerm);
      if (terms.includes(candidate)) return size;
    }
    return undefined;
  };
  return matches(wanted) ?? matches(wanted.replace(/ (recorder|flute)$/, ''));
}

/**
 * Resolve a relative description such as "a fourth below the alto" to a size of the same
 * family. A bare "third", "sixth"… may be major or minor: the one that lands on a size wins.
 */
export function resolveSizeDescription(description: string, field = 'description'): ResolvedSize {
  const text = normalizeTerm(description).replace(/[.!?,;:]+$/, '');
  const direction = DIRECTIONS.map(([pattern, sign]) => ({ sign, parts: text.split(pattern) })).find((d) => d.parts.length === 2);
  if (!direction) throw new ReckonerError(field, `Could not find a direction in "${description.trim()}": ${ACCEPTED_FORMS}.`);
  const [intervalText, referenceText] = direction.parts;
  const reference = findSizeByName(referenceText);
  if (!reference) {
    throw new ReckonerError(field, `"${referenceText.replace(/^the /, '')}" is not a size we know: use a slug or name such as alto, treble, tenor, descant, voice flute, bass.`);
  }
  const interval = parseSpokenInterval(intervalText, field);
  const referenceMidi = nominalNote(reference).midi;
  const family = INSTRUMENT_SIZES.filter((s) => s.family === reference.family);
  const hits = interval.candidates
    .map((span) => direction.sign * span)
    .flatMap((semitones) => family.filter((s) => nominalNote(s).midi === referenceMidi + semitones).map((size) => ({ size, semitones })));
  if (hits.length === 1) return { ...hits[0], reference };
  const directionWord = direction.sign < 0 ? 'below' : 'above';
  if (hits.length > 1) {
    const names = hits.map((h) => h.size.slug).join(' or ');
    throw new ReckonerError(field, `"${description.trim()}" is ambiguous: it could be ${names}; say major or minor.`);
  }
  const target = referenceMidi + direction.sign * interval.candidates[0];
  const nearest = [...family].sort((a, b) => Math.abs(nominalNote(a).midi - target) - Math.abs(nominalNote(b).midi - target))[0];
  const gap = nominalNote(nearest).midi - target;
  throw new ReckonerError(
    field,
    `No ${reference.family} size lies ${/^[aeiou]/.test(interval.text) ? 'an' : 'a'} ${interval.text} ${directionWord} the ${reference.name.toLowerCase()} (${midiToNote(target)}); ` +
      `the nearest is the ${nearest.name.toLowerCase()} (${nearest.nominalLowest}), ${Math.abs(gap)} semitone${Math.abs(gap) === 1 ? '' : 's'} ${gap < 0 ? 'lower' : 'higher'}.`,
  );
}
