import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { Interval, Note } from 'tonal';
import {
  MODERN_A4_HZ, PITCH_STANDARDS, ReckonerError, centsBetween, centsFromModern, midiToNote, nearestNote,
  nearestPitchStandard, noteFrequency, roundTo, validateA4,
} from '@shared/reckoner';
import { errorOf } from './support';

describe('noteFrequency', () => {
  it('puts a′ at 440 Hz by default', () => {
    expect(MODERN_A4_HZ).toBe(440); // ISO 16:1975 — standard tuning frequency
    expect(noteFrequency('A4')).toBe(440); // ISO 16:1975 — standard tuning frequency
  });

  it('matches the published equal-tempered table at A4 = 440 Hz', () => {
    expect(noteFrequency('C4')).toBeCloseTo(261.63, 2); // Suits, MTU equal-tempered table
    expect(noteFrequency('D4')).toBeCloseTo(293.66, 2); // Suits, MTU equal-tempered table
    expect(noteFrequency('E4')).toBeCloseTo(329.63, 2); // Suits, MTU equal-tempered table
    expect(noteFrequency('F4')).toBeCloseTo(349.23, 2); // Suits, MTU equal-tempered table
    expect(noteFrequency('G4')).toBeCloseTo(392.0, 2); // Suits, MTU equal-tempered table
    expect(noteFrequency('C5')).toBeCloseTo(523.25, 2); // Suits, MTU equal-tempered table
  });

  it('follows f = 440·2^(n/12) from C3 to C5', () => {
    for (let midi = 48; midi <= 72; midi += 1) {
      const expected = 440 * 2 ** ((midi - 69) / 12); // Suits, MTU — f = f0·a^n with a = 2^(1/12)
      expect(noteFrequency(midi)).toBeCloseTo(expected, 9);
      expect(noteFrequency(midiToNote(midi))).toBeCloseTo(expected, 9);
    }
    expect(noteFrequency('C3') * 4).toBeCloseTo(noteFrequency('C5'), 9); // Suits, MTU — two octaves is a factor of 4
  });

  it('agrees with tonal for every note C2..C7, sharp and flat spellings', () => {
    for (let midi = 36; midi <= 96; midi += 1) {
      for (const name of [midiToNote(midi, 'sharps'), midiToNote(midi, 'flats')]) {
        expect(noteFrequency(name)).toBeCloseTo(Note.freq(name) as number, 9); // tonal 6.5.1 Note.freq
        expect(Interval.semitones(Interval.distance('C4', name))).toBe(midi - 60); // tonal 6.5.1 Interval.distance/semitones
      }
    }
  });

  it('scales with a′', () => {
    expect(noteFrequency('A4', 415)).toBe(415);
    expect(noteFrequency('D4', 415)).toBeCloseTo(415 * 2 ** (-7 / 12), 9); // Suits, MTU formula with f0 = 415
  });
});

describe('cents', () => {
  it('is 1200·log2 of the ratio', () => {
    expect(centsBetween(440, 880)).toBe(1200); // Ellis (1885) — 1200 cents per octave
    expect(centsBetween(440, 440 * 2 ** (1 / 12))).toBeCloseTo(100, 9); // Ellis (1885) — 100 cents per equal semitone
  });

  it('measures historical a′ against modern pitch', () => {
    expect(centsFromModern(415)).toBeCloseTo(1200 * Math.log2(415 / 440), 12); // Ellis (1885) formula
    expect(roundTo(centsFromModern(415), 1)).toBe(-101.3); // Haynes (2002) — 415 ≈ a semitone below modern; value computed
    expect(roundTo(centsFromModern(392), 1)).toBe(-200); // Haynes (2002) — 392 ≈ a tone below; computed −199.98
    expect(roundTo(centsFromModern(466), 1)).toBe(99.4); // Haynes (2002) — 466 ≈ a semitone above; computed 99.39
    expect(roundTo(centsFromModern(430), 1)).toBe(-39.8); // computed with Ellis (1885) formula
  });

  it('adds up: cents(a,b) + cents(b,c) = cents(a,c)', () => {
    const hz = fc.double({ min: 20, max: 20000, noNaN: true });
    fc.assert(
      fc.property(hz, hz, hz, (a, b, c) => Math.abs(centsBetween(a, b) + centsBetween(b, c) - centsBetween(a, c)) < 1e-7),
    );
  });

  it('refuses non-positive frequencies', () => {
    expect(() => centsBetween(0, 440)).toThrow(ReckonerError);
    expect(() => centsBetween(440, -1)).toThrow(ReckonerError);
    expect(() => centsBetween(440, Number.NaN)).toThrow(ReckonerError);
  });
});

describe('nearestNote', () => {
  it('finds the nearest equal-tempered note at a′ = 440 and its deviation', () => {
    expect(nearestNote(440)).toEqual({ note: 'A4', midi: 69, cents: 0 }); // ISO 16:1975
    const lowD = nearestNote(noteFrequency('D4', 415));
    expect(lowD.note).toBe('C#4'); // references.md CP — a D-size at 415 sounds about C♯ at modern pitch
    expect(roundTo(lowD.cents, 1)).toBe(-1.3); // product.md /api/reckon/sounding example
    expect(nearestNote(261.63).note).toBe('C4'); // Suits, MTU table
  });

  it('spells with sharps', () => {
    expect(nearestNote(466.16).note).toBe('A#4'); // Suits, MTU table — A♯4/B♭4 466.16
  });

  it('keeps the deviation within ±50 cents', () => {
    fc.assert(
      fc.property(fc.double({ min: 30, max: 8000, noNaN: true }), (hz) => {
        const { cents, midi } = nearestNote(hz);
        return cents >= -50 - 1e-9 && cents < 50 + 1e-9 && Math.abs(noteFrequency(midi) * 2 ** (cents / 1200) - hz) < 1e-6 * hz;
      }),
    );
  });
});

describe('a′ validation and standards', () => {
  it('accepts 350–500 Hz, also as query-string text', () => {
    expect(validateA4(350)).toBe(350);
    expect(validateA4(500)).toBe(500);
    expect(validateA4('415')).toBe(415);
  });

  it('throws a ReckonerError on field "a" outside 350–500 Hz or for non-numbers', () => {
    for (const bad of [349.9, 500.1, 0, -440, Number.NaN, Infinity, 'abc', '', null]) {
      expect(() => validateA4(bad)).toThrow(ReckonerError);
    }
    expect(() => validateA4(880)).toThrow(/350–500 Hz/);
    expect(errorOf(() => validateA4(880)).field).toBe('a');
    expect(() => noteFrequency('A4', 220)).toThrow(ReckonerError);
  });

  it('names the usual working standards, about a semitone apart', () => {
    expect(PITCH_STANDARDS.map((s) => s.hz)).toEqual([392, 415, 430, 440, 466]); // Haynes (2002), from memory; CP
    for (const standard of PITCH_STANDARDS) {
      expect(standard.shortName).not.toBe('');
      expect(standard.description.length).toBeGreaterThan(20);
    }
    expect(nearestPitchStandard(415.3).hz).toBe(415);
    expect(nearestPitchStandard(398).hz).toBe(392);
    expect(nearestPitchStandard(464).shortName).toBe('High Baroque');
  });
});

describe('roundTo', () => {
  it('rounds symmetrically and never returns −0', () => {
    expect(roundTo(-1.25, 1)).toBe(-1.3);
    expect(roundTo(1.25, 1)).toBe(1.3);
    expect(Object.is(roundTo(-0.01, 1), 0)).toBe(true);
  });
});
