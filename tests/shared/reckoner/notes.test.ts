import { describe, it, expect } from 'vitest';
import { Note } from 'tonal';
import { ReckonerError, midiToNote, noteToMidi, parseNote, pitchClassName, spellingAtFifths, fifthsOf } from '@shared/reckoner';
import { errorOf } from './support';

describe('parseNote', () => {
  it('reads scientific pitch notation with ASCII and Unicode accidentals', () => {
    expect(noteToMidi('C4')).toBe(60); // MIDI 1.0 Detailed Specification — middle C is key 60 (from memory)
    expect(noteToMidi('A4')).toBe(69); // ISO 16:1975 — a′ is A4; MIDI key 69 (from memory)
    expect(noteToMidi('C#4')).toBe(61); // CP — C♯ a semitone above C
    expect(noteToMidi('Db4')).toBe(61); // CP — enharmonic with C♯
    expect(noteToMidi('E♭4')).toBe(63); // CP
    expect(noteToMidi('B♯3')).toBe(60); // CP — B♯3 is enharmonic with C4
    expect(noteToMidi('Cb4')).toBe(59); // CP — C♭4 is enharmonic with B3
    expect(noteToMidi('F##4')).toBe(67); // CP — double sharp
    expect(noteToMidi('F𝄪4')).toBe(67); // CP
    expect(noteToMidi('Bbb3')).toBe(57); // CP — double flat
    expect(noteToMidi('B𝄫3')).toBe(57); // CP
    expect(noteToMidi('C-1')).toBe(0); // MIDI 1.0 — lowest key (from memory)
  });

  it('agrees with tonal on every spelling it accepts', () => {
    for (const name of ['C4', 'C#4', 'Db4', 'Eb4', 'B#3', 'Cb4', 'F##4', 'Bbb3', 'G5', 'A#2']) {
      expect(noteToMidi(name)).toBe(Note.midi(name)); // tonal 6.5.1 Note.midi — reference library
    }
  });

  it('keeps the spelling and gives a canonical ASCII name', () => {
    expect(parseNote('E♭4')).toMatchObject({ letter: 'E', alter: -1, octave: 4, name: 'Eb4', pitchClass: 3 });
    expect(parseNote('b♯3')).toMatchObject({ letter: 'B', alter: 1, octave: 3, name: 'B#3' });
  });

  it('throws a ReckonerError naming the field for text that is not a note', () => {
    for (const bad of ['H4', 'C', '4', 'C#', 'C44', '', 'Cq4']) {
      expect(() => parseNote(bad, 'lowest')).toThrow(ReckonerError);
    }
    const error = errorOf(() => parseNote('H4', 'lowest'));
    expect(error.field).toBe('lowest');
    expect(error.message).toMatch(/C#4, Db4/);
  });
});

describe('midiToNote', () => {
  it('spells with sharps by default and flats on request', () => {
    expect(midiToNote(61)).toBe('C#4'); // CP
    expect(midiToNote(61, 'flats')).toBe('Db4'); // CP
    expect(midiToNote(59)).toBe('B3'); // CP
    expect(midiToNote(72)).toBe('C5'); // CP
    expect(midiToNote(-1)).toBe('B-2'); // octave numbering continues below C-1
  });

  it('round-trips every MIDI key through parseNote', () => {
    for (let midi = 0; midi <= 127; midi += 1) {
      expect(noteToMidi(midiToNote(midi))).toBe(midi);
      expect(noteToMidi(midiToNote(midi, 'flats'))).toBe(midi);
    }
  });

  it('refuses fractional MIDI numbers', () => {
    expect(() => midiToNote(60.5)).toThrow(ReckonerError);
  });
});

describe('spelling helpers', () => {
  it('names pitch classes', () => {
    expect(pitchClassName(1)).toBe('C#');
    expect(pitchClassName(10, 'flats')).toBe('Bb');
    expect(pitchClassName(-1)).toBe('B');
  });

  it('walks the circle of fifths both ways', () => {
    expect(fifthsOf('F', 1)).toBe(6); // CP — F♯ major has six sharps
    expect(fifthsOf('B', -1)).toBe(-2); // CP — B♭ major has two flats
    for (let fifths = -14; fifths <= 14; fifths += 1) {
      const { letter, alter } = spellingAtFifths(fifths);
      expect(fifthsOf(letter, alter)).toBe(fifths);
    }
  });
});
