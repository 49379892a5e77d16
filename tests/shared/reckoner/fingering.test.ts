import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import {
  INSTRUMENT_SIZES, ReckonerError, fingeringKey, fingeringSignatureShift, formatKey, keyFromSignature, keySignature,
  overviewForPiece, parseFingering, parseKey, soundingKeyFor, tonicPitchClass, type Mode,
} from '@shared/reckoner';
import { errorOf } from './support';

describe('parseKey', () => {
  it('reads the ways keys are written', () => {
    expect(parseKey('Eb major')).toEqual({ letter: 'E', alter: -1, mode: 'major' });
    expect(parseKey('E♭ major')).toEqual({ letter: 'E', alter: -1, mode: 'major' });
    expect(parseKey('e-flat minor')).toEqual({ letter: 'E', alter: -1, mode: 'minor' });
    expect(parseKey('B minor')).toEqual({ letter: 'B', alter: 0, mode: 'minor' });
    expect(parseKey('F# major')).toEqual({ letter: 'F', alter: 1, mode: 'major' });
    expect(parseKey('F sharp minor')).toEqual({ letter: 'F', alter: 1, mode: 'minor' });
    expect(parseKey('C major')).toEqual({ letter: 'C', alter: 0, mode: 'major' });
    expect(parseKey('bb minor')).toEqual({ letter: 'B', alter: -1, mode: 'minor' });
    expect(parseKey('G')).toEqual({ letter: 'G', alter: 0, mode: 'major' });
  });

  it('refuses what is not a key, saying what is accepted', () => {
    const error = errorOf(() => parseKey('H major'));
    expect(error.field).toBe('key');
    expect(error.message).toMatch(/F major/);
    expect(() => parseKey('C lydian')).toThrow(ReckonerError);
    expect(() => parseKey('')).toThrow(ReckonerError);
  });

  it('refuses keys beyond seven accidentals, naming the enharmonic', () => {
    expect(errorOf(() => parseKey('G# major')).message).toMatch(/8 sharps.*Ab major/); // CP — G♯ major is theoretical
    expect(errorOf(() => parseKey('Fb major')).message).toMatch(/8 flats.*E major/); // CP
  });
});

describe('keySignature', () => {
  it('counts sharps as positive and flats as negative', () => {
    expect(keySignature(parseKey('C major'))).toBe(0); // CP — circle of fifths
    expect(keySignature(parseKey('F major'))).toBe(-1); // CP
    expect(keySignature(parseKey('Eb major'))).toBe(-3); // CP
    expect(keySignature(parseKey('B minor'))).toBe(2); // CP
    expect(keySignature(parseKey('D minor'))).toBe(-1); // CP
    expect(keySignature(parseKey('F# major'))).toBe(6); // CP
    expect(keySignature(parseKey('C# major'))).toBe(7); // CP
    expect(keySignature(parseKey('Cb major'))).toBe(-7); // CP
    expect(keySignature(parseKey('e-flat minor'))).toBe(-6); // CP
    expect(keySignature(parseKey('G# minor'))).toBe(5); // CP
  });

  it('spells the key for a signature and mode', () => {
    expect(formatKey(keyFromSignature(-3, 'major'))).toBe('Eb major');
    expect(formatKey(keyFromSignature(-3, 'minor'))).toBe('C minor');
    expect(formatKey(keyFromSignature(6, 'minor'))).toBe('D# minor');
  });
});

describe('fingeringKey', () => {
  it('answers the product.md example: F major on a voice flute read with C fingerings', () => {
    expect(fingeringKey('voice-flute', 'F major', 'C')).toEqual({ fingeringKey: 'Eb major', keySignature: -3, soundingKeySignature: -1 }); // product.md GET /api/reckon/fingering
  });

  it('adds three flats to a D-size part under F fingering and two under C fingering', () => {
    expect(fingeringSignatureShift('voice-flute', 'F')).toBe(-3); // references.md CP — fingered a minor third up
    expect(fingeringSignatureShift('voice-flute', 'C')).toBe(-2); // references.md CP — fingered a major second down
    expect(fingeringKey('voice-flute', 'F major', 'F')).toEqual({ fingeringKey: 'Ab major', keySignature: -4, soundingKeySignature: -1 }); // CP — D→F up a minor third
  });

  it('shows why sharp keys lie better on a D-size than flat keys', () => {
    expect(fingeringKey('voice-flute', 'D major', 'F')).toMatchObject({ fingeringKey: 'F major', keySignature: -1 }); // references.md CP
    expect(fingeringKey('voice-flute', 'Eb major', 'F')).toMatchObject({ fingeringKey: 'Gb major', keySignature: -6 }); // references.md CP
    expect(fingeringKey('voice-flute', 'A major', 'C')).toMatchObject({ fingeringKey: 'G major', keySignature: 1 }); // CP
  });

  it('leaves keys unchanged when the fingering matches the nominal note', () => {
    expect(fingeringKey('alto', 'B minor', 'F')).toMatchObject({ fingeringKey: 'B minor', keySignature: 2 }); // CP — alto reads F fingering at pitch
    expect(fingeringKey('tenor', 'G major', 'C')).toMatchObject({ fingeringKey: 'G major', keySignature: 1 }); // CP — tenor reads C fingering
    expect(fingeringKey('soprano', 'D major', 'C')).toMatchObject({ fingeringKey: 'D major', keySignature: 2 }); // CP
    expect(fingeringKey('bass', 'D minor', 'F')).toMatchObject({ fingeringKey: 'D minor', keySignature: -1 }); // CP
  });

  it('reads an alto with C fingerings a fifth down (“alto read as soprano”)', () => {
    expect(fingeringKey('alto', 'F major', 'C')).toMatchObject({ fingeringKey: 'C major', keySignature: 0 }); // CP
  });

  it('chooses the spelling with fewer accidentals, never more than seven', () => {
    expect(fingeringKey('voice-flute', 'Gb major', 'F')).toMatchObject({ fingeringKey: 'A major', keySignature: 3 }); // −9 respelled as +3
    expect(fingeringKey('voice-flute', 'B major', 'C')).toMatchObject({ fingeringKey: 'A major', keySignature: 3 });
  });

  it('validates size and fingering', () => {
    expect(errorOf(() => fingeringKey('kazoo', 'F major', 'C')).field).toBe('size');
    expect(errorOf(() => parseFingering('G')).field).toBe('fingering');
    expect(parseFingering(' f ')).toBe('F');
  });

  it('transposes to the fingered key and back to the same sounding key', () => {
    const slugs = INSTRUMENT_SIZES.map((s) => s.slug);
    fc.assert(
      fc.property(fc.constantFrom(...slugs), fc.integer({ min: -7, max: 7 }), fc.constantFrom<Mode>('major', 'minor'), fc.constantFrom<'C' | 'F'>('C', 'F'), (slug, signature, mode, fingering) => {
        const sounding = keyFromSignature(signature, mode);
        const fingered = fingeringKey(slug, sounding, fingering);
        const back = soundingKeyFor(slug, fingered.fingeringKey, fingering);
        const sameKey = back.mode === mode && tonicPitchClass(back) === tonicPitchClass(sounding);
        const sameOrEnharmonic = keySignature(back) === signature || Math.abs(keySignature(back) - signature) === 12;
        const sameSpelling = Math.abs(signature) > 5 || keySignature(back) === signature;
        return sameKey && sameOrEnharmonic && sameSpelling && Math.abs(fingered.keySignature) <= 7;
      }),
    );
  });
});

describe('overviewForPiece', () => {
  it('lists every size with C and F fingering keys and the range fit', () => {
    const rows = overviewForPiece({ key: 'D major', lowest: 'D4', highest: 'E6', a4Hz: 440 });
    expect(rows.map((r) => r.slug)).toEqual(INSTRUMENT_SIZES.map((s) => s.slug));
    const voiceFlute = rows.find((r) => r.slug === 'voice-flute')!;
    expect(voiceFlute.fFingering).toEqual({ fingeringKey: 'F major', keySignature: -1, soundingKeySignature: 2 }); // references.md CP
    expect(voiceFlute.cFingering).toEqual({ fingeringKey: 'C major', keySignature: 0, soundingKeySignature: 2 }); // CP
    expect(voiceFlute.range).toMatchObject({ fits: true }); // CP — D-size d′–e‴
    expect(rows.find((r) => r.slug === 'alto')!.range).toMatchObject({ fits: false, semitonesBelow: 3 }); // CP
  });

  it('omits the range when none is given', () => {
    expect(overviewForPiece({ key: 'G minor' })[0].range).toBeUndefined();
  });
});
