import { ReckonerError } from './errors';
import { nameInterval, type NamedInterval } from './intervals';
import { midiToNote, parseNote, type ParsedNote } from './notes';
import { MODERN_A4_HZ, centsBetween, centsFromModern, nearestNote, noteFrequency, roundTo, validateA4 } from './pitch';

export type SizeFamily = 'recorder' | 'flute';

export interface InstrumentSize {
  slug: string;
  family: SizeFamily;
  name: string;
  /** Trade terms and historical names in several languages; matched case- and accent-insensitively. */
  otherNames: readonly string[];
  /** Lowest note at nominal pitch, as it sounds (scientific pitch notation). */
  nominalLowest: string;
  /** Octaves the instrument sounds above its written part (+1: written C4 sounds C5). */
  writtenOctaveOffset: number;
  /** Usual range, sounding at nominal pitch. */
  usualRange: { lowest: string; highest: string };
  hornbostelSachs: string;
}

/** Hornbostel & Sachs 1914 (trans. Baines & Wachsmann 1961): open flutes with internal duct, with fingerholes. */
export const HS_RECORDER = '421.221.12';
/** Hornbostel & Sachs 1914: side-blown open flutes with fingerholes. */
export const HS_SIDE_BLOWN_FLUTE = '421.121.12';

/** Two octaves and a tone above the lowest note: the common baroque compass (CP). */
const TWO_OCTAVES_AND_A_TONE = 26;

function recorder(slug: string, name: string, nominalLowest: string, writtenOctaveOffset: number, otherNames: string[]): InstrumentSize {
  const lowest = parseNote(nominalLowest);
  return {
    slug, family: 'recorder', name, otherNames, nominalLowest, writtenOctaveOffset,
    usualRange: { lowest: nominalLowest, highest: midiToNote(lowest.midi + TWO_OCTAVES_AND_A_TONE) },
    hornbostelSachs: HS_RECORDER,
  };
}

/**
 * Seed vocabulary. Editors may extend it in the database; slugs are a public contract.
 * Octave convention for the lowest two: great bass and contrabass parts are read in bass
 * clef at sounding pitch (offset 0); some editions instead write them like the bass,
 * an octave below sounding — a part from such an edition must be read with offset +1.
 */
export const INSTRUMENT_SIZES: readonly InstrumentSize[] = [
  recorder('sopranino', 'Sopranino recorder', 'F5', 1, ['octave flute', 'flautino', 'Sopraninoblockflöte', 'flûte à bec sopranino']),
  recorder('soprano', 'Soprano recorder', 'C5', 1, ['descant', 'descant recorder', 'fifth flute', 'Sopranblockflöte', 'flûte à bec soprano']),
  recorder('alto', 'Alto recorder', 'F4', 0, ['treble', 'treble recorder', 'common flute', 'flauto', 'Altblockflöte', 'flûte à bec alto']),
  recorder('voice-flute', 'Voice flute', 'D4', 0, ['voice flute', 'flûte de voix', 'D recorder', 'tenor in D']),
  recorder('tenor', 'Tenor recorder', 'C4', 0, ['Tenorblockflöte', 'flûte à bec ténor']),
  recorder('bass', 'Bass recorder', 'F3', 1, ['basset', 'Bassblockflöte', 'flûte à bec basse', 'basse de flûte']),
  recorder('great-bass', 'Great bass recorder', 'C3', 0, ['Großbassblockflöte', 'Grossbass', 'great bass']),
  recorder('contrabass', 'Contrabass recorder', 'F2', 0, ['sub-bass', 'Subbassblockflöte', 'contrabass in F']),
  {
    slug: 'flute-one-keyed', family: 'flute', name: 'One-keyed flute',
    otherNames: ['baroque flute', 'traverso', 'flauto traverso', 'traversa', 'German flute', 'flûte traversière', 'flûte allemande', 'Traversflöte', 'Querflöte'],
    nominalLowest: 'D4', writtenOctaveOffset: 0, usualRange: { lowest: 'D4', highest: 'E6' }, hornbostelSachs: HS_SIDE_BLOWN_FLUTE,
  },
];

export const SIZE_SLUGS = INSTRUMENT_SIZES.map((s) => s.slug) as readonly string[];

export function getSize(slug: string, field = 'size'): InstrumentSize {
  const size = INSTRUMENT_SIZES.find((s) => s.slug === slug);
  if (!size) throw new ReckonerError(field, `Unknown instrument size "${slug}": use one of ${SIZE_SLUGS.join(', ')}.`);
  return size;
}

export function nominalNote(size: InstrumentSize): ParsedNote {
  return parseNote(size.nominalLowest);
}

export interface SoundingLowest {
  nominal: string;
  frequencyHz: number;
  nearest: { note: string; cents: number };
  centsFromModern: number;
}

/** Where a size's lowest note sounds when the instrument is built to a′ = `a4Hz`, described at modern pitch. */
export function soundingLowest(slug: string, a4Hz: number): SoundingLowest {
  const size = getSize(slug);
  const a4 = validateA4(a4Hz);
  const frequencyHz = noteFrequency(size.nominalLowest, a4);
  const nearest = nearestNote(frequencyHz, MODERN_A4_HZ);
  return { nominal: size.nominalLowest, frequencyHz, nearest: { note: nearest.note, cents: nearest.cents }, centsFromModern: centsFromModern(a4) };
}

/** The `GET /api/reckon/sounding` body: Hz to 2 decimals, cents to 1. */
export function reckonSounding(slug: string, a4Hz: number): SoundingLowest {
  const raw = soundingLowest(slug, a4Hz);
  return {
    nominal: raw.nominal,
    frequencyHz: roundTo(raw.frequencyHz, 2),
    nearest: { note: raw.nearest.note, cents: roundTo(raw.nearest.cents, 1) },
    centsFromModern: roundTo(raw.centsFromModern, 1),
  };
}

/** Interval from one size's nominal lowest note to another's (positive when `to` is higher). */
export function intervalBetweenSizes(fromSlug: string, toSlug: string): NamedInterval {
  return nameInterval(nominalNote(getSize(fromSlug, 'from')), nominalNote(getSize(toSlug, 'to')));
}

export interface RangeFit {
  fits: boolean;
  /** Semitones the piece goes below the instrument's lowest note (0 when it does not). */
  semitonesBelow: number;
  /** Semitones the piece goes above the instrument's usual highest note. */
  semitonesAbove: number;
  /** The instrument's range at this a′, as the nearest notes at modern pitch. */
  soundingRange: { lowest: string; highest: string };
}

/**
 * Does a piece fit a size? The piece's notes are sounding notes at modern pitch; the instrument
 * is built to `a4Hz`, so its range is shifted by centsFromModern. Misses under 50 cents count as fitting.
 */
export function checkRange(slug: string, piece: { lowest: string; highest: string }, a4Hz = MODERN_A4_HZ): RangeFit {
  const size = getSize(slug);
  const shift = centsBetween(MODERN_A4_HZ, validateA4(a4Hz)) / 100;
  const low = parseNote(piece.lowest, 'lowest').midi;
  const high = parseNote(piece.highest, 'highest').midi;
  if (high < low) throw new ReckonerError('highest', `The highest note (${piece.highest}) is below the lowest (${piece.lowest}).`);
  const rangeLow = parseNote(size.usualRange.lowest).midi + shift;
  const rangeHigh = parseNote(size.usualRange.highest).midi + shift;
  const semitonesBelow = Math.max(0, Math.round(rangeLow - low));
  const semitonesAbove = Math.max(0, Math.round(high - rangeHigh));
  return {
    fits: semitonesBelow === 0 && semitonesAbove === 0,
    semitonesBelow,
    semitonesAbove,
    soundingRange: { lowest: midiToNote(Math.round(rangeLow)), highest: midiToNote(Math.round(rangeHigh)) },
  };
}
