import { ReckonerError } from './errors';

/** Scientific pitch notation: C4 is middle C, MIDI 60; A4 (a′) is MIDI 69. */
export type NoteLetter = 'C' | 'D' | 'E' | 'F' | 'G' | 'A' | 'B';

export interface SpelledNote {
  letter: NoteLetter;
  /** −2 double flat … +2 double sharp. */
  alter: number;
  octave: number;
}

export interface ParsedNote extends SpelledNote {
  /** Canonical ASCII spelling, e.g. "Eb4", "C#4", "Fx4" is written "F##4". */
  name: string;
  midi: number;
  /** 0 = C … 11 = B. */
  pitchClass: number;
}

export const NOTE_LETTERS: readonly NoteLetter[] = ['C', 'D', 'E', 'F', 'G', 'A', 'B'];
const LETTER_SEMITONES: Record<NoteLetter, number> = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };

const SHARP_NAMES = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B'];
const FLAT_NAMES = ['C', 'Db', 'D', 'Eb', 'E', 'F', 'Gb', 'G', 'Ab', 'A', 'Bb', 'B'];

/** Accidental spellings we accept, longest first so "##" wins over "#". */
const ACCIDENTALS: ReadonlyArray<[string, number]> = [
  ['𝄪', 2], ['𝄫', -2], ['##', 2], ['♯♯', 2], ['bb', -2], ['♭♭', -2], ['x', 2],
  ['#', 1], ['♯', 1], ['b', -1], ['♭', -1], ['♮', 0], ['', 0],
];

const NOTE_FORMS = 'a letter A–G, an optional accidental (# ♯ b ♭, ## x 𝄪, bb 𝄫) and an octave number, e.g. C4, C#4, Db4, E♭4, B♯3';

/** Parse scientific pitch notation. B♯3 and C4 are the same MIDI key but keep their spelling. */
export function parseNote(text: string, field = 'note'): ParsedNote {
  const trimmed = String(text ?? '').trim();
  const letter = trimmed.charAt(0).toUpperCase() as NoteLetter;
  if (!(letter in LETTER_SEMITONES)) {
    throw new ReckonerError(field, `"${trimmed}" is not a note: write ${NOTE_FORMS}.`);
  }
  const rest = trimmed.slice(1);
  for (const [sign, alter] of ACCIDENTALS) {
    if (!rest.startsWith(sign)) continue;
    const octaveText = rest.slice(sign.length);
    if (!/^-?\d$/.test(octaveText)) continue;
    return spelledNote({ letter, alter, octave: Number(octaveText) });
  }
  throw new ReckonerError(field, `"${trimmed}" is not a note: write ${NOTE_FORMS}.`);
}

/** Complete a spelling with its name, MIDI number and pitch class. */
export function spelledNote(note: SpelledNote): ParsedNote {
  const midi = 12 * (note.octave + 1) + LETTER_SEMITONES[note.letter] + note.alter;
  return { ...note, name: formatNote(note), midi, pitchClass: mod(midi, 12) };
}

export function formatNote({ letter, alter, octave }: SpelledNote): string {
  return `${letter}${accidentalText(alter)}${octave}`;
}

/** ASCII accidentals as the API writes them: "#", "b", "##", "bb". */
export function accidentalText(alter: number): string {
  return alter > 0 ? '#'.repeat(alter) : 'b'.repeat(-alter);
}

export function noteToMidi(note: string): number {
  return parseNote(note).midi;
}

/** Spell a MIDI number; sharps by default (the API's convention for nearest notes). */
export function midiToNote(midi: number, prefer: 'sharps' | 'flats' = 'sharps'): string {
  if (!Number.isInteger(midi)) throw new ReckonerError('midi', `MIDI number must be an integer, got ${midi}.`);
  const names = prefer === 'sharps' ? SHARP_NAMES : FLAT_NAMES;
  return `${names[mod(midi, 12)]}${Math.floor(midi / 12) - 1}`;
}

export function pitchClassName(pitchClass: number, prefer: 'sharps' | 'flats' = 'sharps'): string {
  return (prefer === 'sharps' ? SHARP_NAMES : FLAT_NAMES)[mod(pitchClass, 12)];
}

/** Letter steps from `from` up to `to` (C4→E4 = 2; C4→C5 = 7), for naming intervals. */
export function diatonicSteps(from: SpelledNote, to: SpelledNote): number {
  const index = (n: SpelledNote) => n.octave * 7 + NOTE_LETTERS.indexOf(n.letter);
  return index(to) - index(from);
}

/** Position on the circle of fifths (C = 0, G = 1, F = −1, F# = 6, Bb = −2). */
export function fifthsOf(letter: NoteLetter, alter: number): number {
  const natural: Record<NoteLetter, number> = { F: -1, C: 0, G: 1, D: 2, A: 3, E: 4, B: 5 };
  return natural[letter] + 7 * alter;
}

/** Inverse of fifthsOf: the spelling at a circle-of-fifths position. */
export function spellingAtFifths(fifths: number): { letter: NoteLetter; alter: number } {
  const alter = Math.floor((fifths + 1) / 7);
  const letters: NoteLetter[] = ['F', 'C', 'G', 'D', 'A', 'E', 'B'];
  return { letter: letters[fifths - 7 * alter + 1], alter };
}

export function mod(n: number, m: number): number {
  return ((n % m) + m) % m;
}
