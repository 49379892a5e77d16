import { ReckonerError } from './errors';
import { accidentalText, fifthsOf, mod, spellingAtFifths, type NoteLetter } from './notes';
import { normalizeTerm } from './size-phrases';
import { INSTRUMENT_SIZES, checkRange, getSize, nominalNote, type RangeFit } from './sizes';
import { MODERN_A4_HZ } from './pitch';

export type Mode = 'major' | 'minor';
export type Fingering = 'C' | 'F';

export interface MusicalKey {
  letter: NoteLetter;
  alter: number;
  mode: Mode;
}

const KEY_FORMS = 'a tonic A–G with an optional sharp or flat and the mode, e.g. "F major", "E♭ major", "e-flat minor", "F# major", "B minor"';

/** Read "Eb major", "E♭ major", "e-flat minor", "F sharp minor", "B minor"; the mode defaults to major. */
export function parseKey(text: string, field = 'key'): MusicalKey {
  const cleaned = normalizeTerm(String(text ?? '').replace(/♭/g, 'b').replace(/♯/g, '#'));
  const match = /^([a-g])\s*(#|b|sharp|flat)?\s*(major|minor|maj|min|dur|moll)?$/.exec(cleaned);
  if (!match) throw new ReckonerError(field, `"${String(text ?? '').trim()}" is not a key: write ${KEY_FORMS}.`);
  const [, letter, accidental, modeWord] = match;
  const alter = accidental === '#' || accidental === 'sharp' ? 1 : accidental === 'b' || accidental === 'flat' ? -1 : 0;
  const mode: Mode = modeWord && /^(minor|min|moll)$/.test(modeWord) ? 'minor' : 'major';
  const key: MusicalKey = { letter: letter.toUpperCase() as NoteLetter, alter, mode };
  const signature = keySignature(key);
  if (Math.abs(signature) > 7) {
    throw new ReckonerError(field, `${formatKey(key)} would need ${Math.abs(signature)} ${signature > 0 ? 'sharps' : 'flats'}; write its enharmonic ${formatKey(keyFromSignature(signature - 12 * Math.sign(signature), mode))}.`);
  }
  return key;
}

export function formatKey(key: MusicalKey): string {
  return `${key.letter}${accidentalText(key.alter)} ${key.mode}`;
}

/** Sharps (positive) or flats (negative) in the key signature: F major −1, B minor +2. */
export function keySignature(key: MusicalKey): number {
  return fifthsOf(key.letter, key.alter) - (key.mode === 'minor' ? 3 : 0);
}

export function keyFromSignature(signature: number, mode: Mode): MusicalKey {
  return { ...spellingAtFifths(signature + (mode === 'minor' ? 3 : 0)), mode };
}

/** Keep a signature within ±7, preferring fewer accidentals; at ±6 keep the spelling the transposition gave. */
function simplestSignature(signature: number): number {
  let best = signature;
  for (const candidate of [signature - 12, signature + 12]) {
    if (Math.abs(candidate) < Math.abs(best)) best = candidate;
  }
  return best;
}

/**
 * Change of key signature from sounding to fingered: the nominal lowest note is fingered
 * as C or F, so D-size with F-fingering reads a minor third up (−3), with C a tone down (−2).
 */
export function fingeringSignatureShift(slug: string, fingering: Fingering): number {
  const nominal = nominalNote(getSize(slug));
  return fifthsOf(fingering, 0) - fifthsOf(nominal.letter, nominal.alter);
}

export function parseFingering(text: string, field = 'fingering'): Fingering {
  const value = String(text ?? '').trim().toUpperCase();
  if (value !== 'C' && value !== 'F') throw new ReckonerError(field, `Fingering must be C or F, got "${String(text ?? '').trim()}".`);
  return value;
}

export interface FingeringResult {
  fingeringKey: string;
  keySignature: number;
  soundingKeySignature: number;
}

/** The `GET /api/reckon/fingering` body: the key a player's fingers work in for a sounding key. */
export function fingeringKey(slug: string, soundingKey: string | MusicalKey, fingering: Fingering): FingeringResult {
  const key = typeof soundingKey === 'string' ? parseKey(soundingKey) : soundingKey;
  const soundingKeySignature = keySignature(key);
  const signature = simplestSignature(soundingKeySignature + fingeringSignatureShift(slug, parseFingering(fingering)));
  return { fingeringKey: formatKey(keyFromSignature(signature, key.mode)), keySignature: signature, soundingKeySignature };
}

/** Inverse of fingeringKey: which key sounds when the player fingers `fingered`. */
export function soundingKeyFor(slug: string, fingered: string | MusicalKey, fingering: Fingering): MusicalKey {
  const key = typeof fingered === 'string' ? parseKey(fingered) : fingered;
  const signature = simplestSignature(keySignature(key) - fingeringSignatureShift(slug, parseFingering(fingering)));
  return keyFromSignature(signature, key.mode);
}

/** Pitch class of a key's tonic (0 = C), to compare keys across enharmonic spellings. */
export function tonicPitchClass(key: MusicalKey): number {
  return mod(7 * fifthsOf(key.letter, key.alter), 12);
}

export interface SizeOverview {
  slug: string;
  name: string;
  nominalLowest: string;
  cFingering: FingeringResult;
  fFingering: FingeringResult;
  range?: RangeFit;
}

/** Every size at once for one piece, for the Reckoner page: fingering keys under C and F, and range fit if a range is given. */
export function overviewForPiece(piece: { key: string; lowest?: string; highest?: string; a4Hz?: number }): SizeOverview[] {
  const key = parseKey(piece.key);
  const hasRange = piece.lowest !== undefined && piece.highest !== undefined;
  return INSTRUMENT_SIZES.map((size) => ({
    slug: size.slug,
    name: size.name,
    nominalLowest: size.nominalLowest,
    cFingering: fingeringKey(size.slug, key, 'C'),
    fFingering: fingeringKey(size.slug, key, 'F'),
    ...(hasRange ? { range: checkRange(size.slug, { lowest: piece.lowest!, highest: piece.highest! }, piece.a4Hz ?? MODERN_A4_HZ) } : {}),
  }));
}
