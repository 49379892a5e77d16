import { ReckonerError } from './errors';
import { diatonicSteps, type SpelledNote } from './notes';

/** Semitones of the major/perfect interval for each simple interval number (1 = unison … 8 = octave). */
const STANDARD_SEMITONES = [0, 0, 2, 4, 5, 7, 9, 11, 12];
const PERFECT_NUMBERS = new Set([1, 4, 5, 8]);
const ORDINALS = ['', 'unison', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh', 'octave'];

export type IntervalQuality = 'perfect' | 'major' | 'minor' | 'augmented' | 'diminished';

export interface NamedInterval {
  /** Signed: positive when the second note is higher. */
  semitones: number;
  /** Plain English, e.g. "major second", "octave", "perfect fourth and an octave". */
  name: string;
}

/** Name the interval between two spelled notes from their letters and semitones (D4→F4 = minor third). */
export function nameInterval(from: SpelledNote & { midi: number }, to: SpelledNote & { midi: number }): NamedInterval {
  const semitones = to.midi - from.midi;
  const upward = semitones > 0 || (semitones === 0 && diatonicSteps(from, to) >= 0);
  const [low, high] = upward ? [from, to] : [to, from];
  const steps = diatonicSteps(low, high);
  const span = Math.abs(semitones);
  if (steps < 0) return { semitones, name: `${span} semitones` };
  const octaves = Math.floor(steps / 7);
  let simpleNumber = (steps % 7) + 1;
  let simpleSemitones = span - 12 * octaves;
  let extraOctaves = octaves;
  if (simpleNumber === 1 && octaves > 0) {
    simpleNumber = 8;
    simpleSemitones += 12;
    extraOctaves -= 1;
  }
  const quality = qualityOf(simpleNumber, simpleSemitones);
  if (!quality) return { semitones, name: `${span} semitones` };
  const simple = simpleName(simpleNumber, quality);
  return { semitones, name: withOctaves(simple, extraOctaves) };
}

function qualityOf(simpleNumber: number, semitones: number): IntervalQuality | null {
  const diff = semitones - STANDARD_SEMITONES[simpleNumber];
  if (PERFECT_NUMBERS.has(simpleNumber)) {
    return diff === 0 ? 'perfect' : diff === 1 ? 'augmented' : diff === -1 ? 'diminished' : null;
  }
  return diff === 0 ? 'major' : diff === -1 ? 'minor' : diff === 1 ? 'augmented' : diff === -2 ? 'diminished' : null;
}

function simpleName(simpleNumber: number, quality: IntervalQuality): string {
  if (quality === 'perfect' && (simpleNumber === 1 || simpleNumber === 8)) return ORDINALS[simpleNumber];
  return `${quality} ${ORDINALS[simpleNumber]}`;
}

function withOctaves(simple: string, octaves: number): string {
  if (octaves === 0) return simple;
  if (simple === 'octave') return octaves === 1 ? 'two octaves' : `${octaves + 1} octaves`;
  if (simple === 'unison') return octaves === 1 ? 'octave' : `${octaves} octaves`;
  return `${simple} and ${octaves === 1 ? 'an octave' : `${octaves} octaves`}`;
}

/** Semitone sizes a spoken interval may stand for; a bare "third" may be major or minor. */
export interface SpokenInterval {
  text: string;
  candidates: number[];
}

const NAMED_SPANS: Record<string, number> = {
  semitone: 1, 'half tone': 1, 'half step': 1, 'minor second': 1,
  tone: 2, 'whole tone': 2, 'whole step': 2,
  'tone and a half': 3, 'tone and half': 3, semiditone: 3, 'minor third': 3,
  ditone: 4, 'two tones': 4,
  tritone: 6,
  octave: 12, 'perfect octave': 12, 'two octaves': 24, 'double octave': 24,
};

const NUMERALS: Record<string, number> = {
  second: 2, '2nd': 2, third: 3, '3rd': 3, fourth: 4, '4th': 4, fifth: 5, '5th': 5,
  sixth: 6, '6th': 6, seventh: 7, '7th': 7, octave: 8, '8th': 8, '8ve': 8,
};

export const SPOKEN_INTERVAL_FORMS =
  'semitone, tone, tone and a half, ditone, or an ordinal second … seventh, octave (optionally major, minor, perfect, augmented, diminished)';

/** Read an interval as a player would say it: "a tone and a half", "a fourth", "a minor third". */
export function parseSpokenInterval(text: string, field = 'description'): SpokenInterval {
  const cleaned = text.trim().toLowerCase().replace(/-/g, ' ').replace(/\s+/g, ' ').replace(/^(a|an|one) /, '');
  if (cleaned in NAMED_SPANS) return { text: cleaned, candidates: [NAMED_SPANS[cleaned]] };
  const match = /^(?:(perfect|major|minor|augmented|diminished) )?(\S+)$/.exec(cleaned);
  const number = match ? NUMERALS[match[2]] : undefined;
  if (!match || !number) {
    throw new ReckonerError(field, `Could not read "${text.trim()}" as an interval: use ${SPOKEN_INTERVAL_FORMS}.`);
  }
  const quality = match[1] as IntervalQuality | undefined;
  const standard = STANDARD_SEMITONES[number];
  const perfectType = PERFECT_NUMBERS.has(number);
  if (quality === undefined) return { text: cleaned, candidates: perfectType ? [standard] : [standard, standard - 1] };
  const offsets: Record<IntervalQuality, number | null> = perfectType
    ? { perfect: 0, augmented: 1, diminished: -1, major: null, minor: null }
    : { major: 0, minor: -1, augmented: 1, diminished: -2, perfect: null };
  const offset = offsets[quality];
  if (offset === null) {
    throw new ReckonerError(field, `A ${ORDINALS[number]} cannot be ${quality}: use ${perfectType ? 'perfect, augmented or diminished' : 'major, minor, augmented or diminished'}.`);
  }
  return { text: cleaned, candidates: [standard + offset] };
}
