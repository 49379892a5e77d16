import { ReckonerError } from './errors';
import { midiToNote, parseNote } from './notes';

export { ReckonerError } from './errors';

/** ISO 16:1975 standard tuning frequency. */
export const MODERN_A4_HZ = 440;
export const A4_MIDI = 69;
/** Widest a′ the reckoner accepts: beyond the historical extremes (~380–480 Hz) with room for typos to be caught. */
export const A4_MIN_HZ = 350;
export const A4_MAX_HZ = 500;

export interface PitchStandard {
  hz: number;
  shortName: string;
  description: string;
}

/** Working pitch standards of today's historical performance, about a semitone apart. Wording is ours. */
export const PITCH_STANDARDS: readonly PitchStandard[] = [
  { hz: 392, shortName: 'Low French', description: 'About a whole tone below modern pitch; used for French music of around 1700 and instruments built for it.' },
  { hz: 415, shortName: 'Baroque', description: 'About a semitone below modern pitch; the usual working pitch for late-Baroque music today.' },
  { hz: 430, shortName: 'Classical', description: 'A little below modern pitch; a common choice for music of the later 18th century.' },
  { hz: 440, shortName: 'Modern', description: 'Today’s standard tuning frequency (ISO 16).' },
  { hz: 466, shortName: 'High Baroque', description: 'About a semitone above modern pitch; used for some 17th-century German and Venetian repertoire.' },
];

/** Accept a′ between 350 and 500 Hz; anything else is almost certainly a mistake (or not an a′). */
export function validateA4(hz: unknown, field = 'a'): number {
  const value = typeof hz === 'string' && hz.trim() !== '' ? Number(hz) : hz;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ReckonerError(field, `a′ must be a number of hertz between ${A4_MIN_HZ} and ${A4_MAX_HZ}, e.g. 415.`);
  }
  if (value < A4_MIN_HZ || value > A4_MAX_HZ) {
    throw new ReckonerError(field, `a′ = ${value} Hz is outside the accepted ${A4_MIN_HZ}–${A4_MAX_HZ} Hz; historical pitches lie between about 380 and 480 Hz.`);
  }
  return value;
}

/** Equal-tempered frequency: f = a′ · 2^((n − 69)/12). Takes a note name or a MIDI number. */
export function noteFrequency(note: string | number, a4Hz = MODERN_A4_HZ): number {
  const midi = typeof note === 'number' ? note : parseNote(note).midi;
  return validateA4(a4Hz) * 2 ** ((midi - A4_MIDI) / 12);
}

/** Cents from one frequency to another (Ellis 1885): positive when `toHz` is higher. */
export function centsBetween(fromHz: number, toHz: number): number {
  for (const [field, hz] of [['from', fromHz], ['to', toHz]] as const) {
    if (!Number.isFinite(hz) || hz <= 0) throw new ReckonerError(field, `A frequency must be a positive number of hertz, got ${hz}.`);
  }
  return 1200 * Math.log2(toHz / fromHz);
}

/** Cents of an a′ from modern 440 Hz: 415 → about −101.3. */
export function centsFromModern(a4Hz: number): number {
  return centsBetween(MODERN_A4_HZ, validateA4(a4Hz));
}

export interface NearestNote {
  /** Spelled with sharps, e.g. "C#4". */
  note: string;
  midi: number;
  /** Deviation of the frequency from that note, in cents (−50 … +50). */
  cents: number;
}

/** The nearest equal-tempered note to a frequency, and how far off it is, at a′ = 440 unless told. */
export function nearestNote(hz: number, a4Hz = MODERN_A4_HZ): NearestNote {
  const fractionalMidi = A4_MIDI + centsBetween(validateA4(a4Hz), hz) / 100;
  // Round half up so exactly −50 and +50 cents resolve the same way every time.
  const midi = Math.floor(fractionalMidi + 0.5);
  return { note: midiToNote(midi, 'sharps'), midi, cents: (fractionalMidi - midi) * 100 };
}

/** The named standard closest to an a′ (in cents), for labelling pitch tags. */
export function nearestPitchStandard(a4Hz: number): PitchStandard & { cents: number } {
  const hz = validateA4(a4Hz);
  const ranked = PITCH_STANDARDS.map((s) => ({ ...s, cents: centsBetween(s.hz, hz) }));
  ranked.sort((a, b) => Math.abs(a.cents) - Math.abs(b.cents));
  return ranked[0];
}

/** Round for display: Hz to 2 decimals, cents to 1; never returns −0. */
export function roundTo(value: number, decimals: number): number {
  const factor = 10 ** decimals;
  // Symmetric about zero: −1.25 and 1.25 both round away from zero.
  const rounded = (Math.sign(value) * Math.round(Math.abs(value) * factor)) / factor;
  return Object.is(rounded, -0) ? 0 : rounded;
}
