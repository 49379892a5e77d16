import { describe, it, expect } from 'vitest';
import { Interval } from 'tonal';
import {
  HS_RECORDER, INSTRUMENT_SIZES, SIZE_SLUGS, checkRange, findSizeByName, getSize, intervalBetweenSizes,
  noteToMidi, reckonSounding, resolveSizeDescription, soundingLowest,
} from '@shared/reckoner';
import { errorOf } from './support';

describe('instrument size vocabulary', () => {
  it('has the contract slugs', () => {
    expect(SIZE_SLUGS).toEqual(['sopranino', 'soprano', 'alto', 'voice-flute', 'tenor', 'bass', 'great-bass', 'contrabass', 'flute-one-keyed']); // product.md data model
  });

  it('gives each recorder size its nominal lowest note and octave of notation', () => {
    const nominal = Object.fromEntries(INSTRUMENT_SIZES.map((s) => [s.slug, [s.nominalLowest, s.writtenOctaveOffset]]));
    expect(nominal.sopranino).toEqual(['F5', 1]); // ARS, "Which Octave Should I Play?" (2018); CP
    expect(nominal.soprano).toEqual(['C5', 1]); // ARS (2018); CP
    expect(nominal.alto).toEqual(['F4', 0]); // ARS (2018); CP
    expect(nominal['voice-flute']).toEqual(['D4', 0]); // CP
    expect(nominal.tenor).toEqual(['C4', 0]); // ARS (2018); CP
    expect(nominal.bass).toEqual(['F3', 1]); // ARS (2018); CP
    expect(nominal['great-bass']).toEqual(['C3', 0]); // CP — our stated convention: read at sounding pitch
    expect(nominal.contrabass).toEqual(['F2', 0]); // CP — our stated convention
    expect(nominal['flute-one-keyed']).toEqual(['D4', 0]); // CP — one-keyed flute's lowest d′
  });

  it('classifies recorders and the flute by Hornbostel–Sachs', () => {
    expect(HS_RECORDER).toBe('421.221.12'); // Hornbostel & Sachs 1914, trans. Baines & Wachsmann 1961
    for (const size of INSTRUMENT_SIZES.filter((s) => s.family === 'recorder')) {
      expect(size.hornbostelSachs).toBe('421.221.12'); // Hornbostel & Sachs 1914, trans. Baines & Wachsmann 1961
    }
    expect(getSize('flute-one-keyed').hornbostelSachs).toBe('421.121.12'); // Hornbostel & Sachs 1914 — side-blown flute with fingerholes
  });

  it('gives the usual range of two octaves and a tone', () => {
    expect(getSize('alto').usualRange).toEqual({ lowest: 'F4', highest: 'G6' }); // references.md CP — alto f′–g‴
    for (const size of INSTRUMENT_SIZES) {
      expect(noteToMidi(size.usualRange.highest) - noteToMidi(size.usualRange.lowest)).toBe(26); // CP — two octaves and a tone
      expect(size.usualRange.lowest).toBe(size.nominalLowest);
    }
  });

  it('names trade terms: treble is the alto, descant the soprano', () => {
    expect(findSizeByName('treble')?.slug).toBe('alto'); // CP — English usage
    expect(findSizeByName('the descant recorder')?.slug).toBe('soprano'); // CP
    expect(findSizeByName('Flûte de voix')?.slug).toBe('voice-flute'); // CP — French name of the D-size
    expect(findSizeByName('flute de voix')?.slug).toBe('voice-flute'); // accent-insensitive
    expect(findSizeByName('traverso')?.slug).toBe('flute-one-keyed'); // CP
    expect(findSizeByName('voice-flute')?.slug).toBe('voice-flute');
    expect(findSizeByName('crumhorn')).toBeUndefined();
  });

  it('throws for an unknown slug, listing the accepted ones', () => {
    const error = errorOf(() => getSize('piccolo'));
    expect(error.field).toBe('size');
    expect(error.message).toMatch(/voice-flute/);
  });
});

describe('soundingLowest / reckonSounding', () => {
  it('answers the product.md example for a voice flute at a′ = 415', () => {
    expect(reckonSounding('voice-flute', 415)).toEqual({
      nominal: 'D4',
      frequencyHz: 276.98,
      nearest: { note: 'C#4', cents: -1.3 },
      centsFromModern: -101.3,
    }); // product.md GET /api/reckon/sounding; references.md CP — D-size at 415 sounds about C♯ (−101.3 cents)
  });

  it('keeps full precision in the raw helper', () => {
    const raw = soundingLowest('voice-flute', 415);
    expect(raw.frequencyHz).toBeCloseTo(415 * 2 ** (-7 / 12), 10); // Suits, MTU formula with a′ = 415
    expect(raw.centsFromModern).toBeCloseTo(1200 * Math.log2(415 / 440), 10); // Ellis (1885)
  });

  it('sounds at the nominal note at modern pitch', () => {
    expect(reckonSounding('alto', 440)).toEqual({ nominal: 'F4', frequencyHz: 349.23, nearest: { note: 'F4', cents: 0 }, centsFromModern: 0 }); // Suits, MTU table — F4 349.23
    expect(reckonSounding('tenor', 440).frequencyHz).toBe(261.63); // Suits, MTU table — C4 261.63
  });

  it('puts an alto at 392 a tone low, on D♯4', () => {
    const result = reckonSounding('alto', 392);
    expect(result.nearest.note).toBe('D#4'); // Haynes (2002) — 392 about a tone below modern; CP
    expect(result.centsFromModern).toBe(-200); // computed, Ellis (1885)
  });

  it('validates size and a′', () => {
    expect(errorOf(() => reckonSounding('voice-flute', 600)).field).toBe('a');
    expect(errorOf(() => reckonSounding('nope', 415)).field).toBe('size');
  });
});

describe('intervalBetweenSizes', () => {
  it('places the D-size a major second above the tenor and a minor third below the alto', () => {
    expect(intervalBetweenSizes('tenor', 'voice-flute')).toEqual({ semitones: 2, name: 'major second' }); // references.md CP
    expect(intervalBetweenSizes('voice-flute', 'alto')).toEqual({ semitones: 3, name: 'minor third' }); // references.md CP
    expect(intervalBetweenSizes('alto', 'voice-flute')).toEqual({ semitones: -3, name: 'minor third' }); // references.md CP
  });

  it('names fourths, fifths, octaves and compounds', () => {
    expect(intervalBetweenSizes('alto', 'tenor')).toEqual({ semitones: -5, name: 'perfect fourth' }); // CP
    expect(intervalBetweenSizes('alto', 'soprano')).toEqual({ semitones: 7, name: 'perfect fifth' }); // CP
    expect(intervalBetweenSizes('alto', 'bass')).toEqual({ semitones: -12, name: 'octave' }); // CP
    expect(intervalBetweenSizes('sopranino', 'bass')).toEqual({ semitones: -24, name: 'two octaves' }); // CP
    expect(intervalBetweenSizes('alto', 'great-bass')).toEqual({ semitones: -17, name: 'perfect fourth and an octave' }); // CP
    expect(intervalBetweenSizes('voice-flute', 'flute-one-keyed')).toEqual({ semitones: 0, name: 'unison' }); // CP — both lowest D4
  });

  it('agrees with tonal on every pair of sizes', () => {
    for (const a of INSTRUMENT_SIZES) {
      for (const b of INSTRUMENT_SIZES) {
        const expected = Interval.semitones(Interval.distance(a.nominalLowest, b.nominalLowest)); // tonal 6.5.1 Interval.distance/semitones
        expect(intervalBetweenSizes(a.slug, b.slug).semitones).toBe(expected);
      }
    }
  });
});

describe('resolveSizeDescription', () => {
  const cases: Array<[string, string]> = [
    ['a tone and a half lower than the treble', 'voice-flute'], // CP — D-size a minor third below the F alto
    ['a fourth below the alto', 'tenor'], // CP
    ['a tone above the tenor', 'voice-flute'], // references.md CP — D-size a major second above the C tenor
    ['a minor third below the alto', 'voice-flute'], // references.md CP
    ['an octave below the alto', 'bass'], // CP
    ['a fifth above the bass', 'tenor'], // CP
    ['A perfect fifth higher than the alto.', 'soprano'], // CP
    ['a major second under the voice flute', 'tenor'], // CP
    ['a semiditone below the treble recorder', 'voice-flute'], // CP — semiditone = minor third
    ['a third below the alto', 'voice-flute'], // only the minor third lands on a size
    ['a fourth above the descant', 'sopranino'], // CP — sopranino F5 a fourth above soprano C5
  ];

  it.each(cases)('reads "%s" as %s', (description, slug) => {
    expect(resolveSizeDescription(description).size.slug).toBe(slug);
  });

  it('returns the reference and the signed interval', () => {
    const resolved = resolveSizeDescription('a fourth below the alto');
    expect(resolved.reference.slug).toBe('alto');
    expect(resolved.semitones).toBe(-5);
  });

  it('says when no size lies at that interval, naming the nearest', () => {
    const error = errorOf(() => resolveSizeDescription('an octave above the descant'));
    expect(error.field).toBe('description');
    expect(error.message).toMatch(/No recorder size/);
    expect(error.message).toMatch(/nearest is the sopranino/);
    expect(errorOf(() => resolveSizeDescription('a ditone below the alto')).message).toMatch(/C#4.*nearest/);
  });

  it('says what was not understood and what forms are accepted', () => {
    expect(errorOf(() => resolveSizeDescription('the alto')).message).toMatch(/direction.*a fourth below the alto/);
    expect(errorOf(() => resolveSizeDescription('a quint above the bass')).message).toMatch(/interval.*tone and a half/);
    expect(errorOf(() => resolveSizeDescription('a fourth below the crumhorn')).message).toMatch(/"crumhorn" is not a size/);
    expect(errorOf(() => resolveSizeDescription('a major fourth below the alto')).message).toMatch(/perfect, augmented or diminished/);
  });
});

describe('checkRange', () => {
  it('fits a piece within the usual range at modern pitch', () => {
    expect(checkRange('alto', { lowest: 'F4', highest: 'G6' })).toMatchObject({ fits: true, semitonesBelow: 0, semitonesAbove: 0 }); // CP — alto f′–g‴
  });

  it('counts semitones out of range at each end', () => {
    expect(checkRange('alto', { lowest: 'D4', highest: 'A6' })).toMatchObject({ fits: false, semitonesBelow: 3, semitonesAbove: 2 });
  });

  it('shifts the instrument’s range by its a′', () => {
    const at415 = checkRange('alto', { lowest: 'E4', highest: 'F#6' }, 415);
    expect(at415).toMatchObject({ fits: true, soundingRange: { lowest: 'E4', highest: 'F#6' } }); // CP — at 415 an alto sounds a semitone low
    expect(checkRange('alto', { lowest: 'F4', highest: 'G6' }, 415)).toMatchObject({ fits: false, semitonesBelow: 0, semitonesAbove: 1 });
    expect(checkRange('alto', { lowest: 'F4', highest: 'G6' }, 430).fits).toBe(true); // −40 cents rounds to the same note
  });

  it('refuses a reversed range', () => {
    expect(errorOf(() => checkRange('alto', { lowest: 'G6', highest: 'F4' })).field).toBe('highest');
  });
});
