import { describe, expect, it } from 'vitest';
import { checkRisSyntax, cslToSourceInput, languageTag, recordLines } from '@shared/citations/import';
import { fingeringText, rangeText, reckonPiece } from '@shared/programmes/pieces';

describe('RIS syntax (RIS Format Specifications, 2011: "XX  - value", TY first, ER last)', () => {
  it('accepts well-formed records', () => {
    expect(checkRisSyntax('TY  - BOOK\r\nTI  - X\r\nER  - \r\n\r\nTY  - GEN\nER  -\n')).toBeNull();
  });
  it('names the line of a malformed tag, a record without TY, or without ER', () => {
    expect(checkRisSyntax('TY  - BOOK\nTI - X\nER  - ')).toMatchObject({ line: 2 });
    expect(checkRisSyntax('TI  - X\nER  - ')).toMatchObject({ line: 1, message: expect.stringMatching(/starts with TY/) });
    expect(checkRisSyntax('TY  - BOOK\nTI  - X\nTY  - BOOK\nER  - ')).toMatchObject({ line: 3 });
    expect(checkRisSyntax('\nTY  - BOOK\nTI  - X\n')).toMatchObject({ line: 2, message: expect.stringMatching(/no ER/) });
  });
  it('finds where each record starts', () => {
    expect(recordLines('TY  - BOOK\nER  - \n\nTY  - GEN\nER  - ', 'ris')).toEqual([1, 4]);
    expect(recordLines('% c\n@book{a,\n}\n@comment{x}\n@misc{b,}', 'bibtex')).toEqual([2, 5]);
  });
});

describe('parsed entries → draft source fields', () => {
  it('maps a CSL book to a printed treatise and a manuscript to an archival source', () => {
    expect(cslToSourceInput({ type: 'book', title: 'Principes', author: [{ family: 'Hotteterre', given: 'Jacques-Martin' }], issued: { 'date-parts': [[1707]] }, publisher: 'Ballard', 'publisher-place': 'Paris', language: 'french' }))
      .toMatchObject({ sourceType: 'treatise', dateEdtf: '1707', languages: ['fr'], creators: [{ name: 'Hotteterre, Jacques-Martin', role: 'author' }], publication: { publisher: 'Ballard', place: 'Paris', edition: null } });
    expect(cslToSourceInput({ type: 'manuscript', title: 'Inventar', publisher: 'Staatsarchiv', archive_location: 'Loc. 1', issued: { 'date-parts': [[1703, 5, 12]], circa: true } }))
      .toMatchObject({ sourceType: 'other', holdingInstitution: 'Staatsarchiv', shelfmark: 'Loc. 1', dateEdtf: '1703-05-12~', publication: null });
  });
  it('turns two date-parts into an EDTF interval', () => {
    expect(cslToSourceInput({ type: 'document', title: 'x', issued: { 'date-parts': [[1700], [1725]] } }).dateEdtf).toBe('1700/1725');
  });
  it('reads language names and BCP 47 tags (BCP 47 = IETF RFC 5646)', () => {
    expect(languageTag('de')).toBe('de');
    expect(languageTag('en_GB')).toBe('en-GB');
    expect(languageTag('Latin')).toBe('la');
    expect(languageTag('Klingon')).toBeNull();
  });
});

describe('pieces in a programme', () => {
  // Handbook references, "Facts of the trade" (CP): D-size with F-fingering is fingered a minor third up (3 flats added).
  it('gives the fingered key and flags flat-heavy cross-fingered keys', () => {
    const r = reckonPiece({ key: 'F major', sizeSlug: 'voice-flute', aHz: 415, lowest: null, highest: null, fingering: 'F' });
    expect(r.fingering).toMatchObject({ fingeringKey: 'Ab major', keySignature: -4, soundingKeySignature: -1 });
    expect(r.crossFingered).toBe(true);
    expect(fingeringText({ fingering: 'F' }, r)).toBe('F-fingering: fingered in Ab major (4 flats) — cross-fingered key');
    // A sounding key with sharps lies better on a D-size (CP): D major → F major under F-fingering.
    const d = reckonPiece({ key: 'D major', sizeSlug: 'voice-flute', aHz: 415, lowest: null, highest: null, fingering: 'F' });
    expect(d.fingering?.fingeringKey).toBe('F major');
    expect(d.crossFingered).toBe(false);
  });
  it('checks the range and reports errors without throwing', () => {
    const r = reckonPiece({ key: 'F major', sizeSlug: 'alto', aHz: 440, lowest: 'F4', highest: 'G6', fingering: 'F' });
    expect(rangeText(r)).toMatch(/^fits/);
    const low = reckonPiece({ key: 'F major', sizeSlug: 'alto', aHz: 440, lowest: 'D4', highest: 'G6', fingering: 'F' });
    expect(rangeText(low)).toMatch(/^does not fit: 3 semitones below/);
    expect(reckonPiece({ key: 'H major', sizeSlug: 'alto', aHz: 415, lowest: null, highest: null, fingering: 'F' }).error).toMatch(/not a key/);
  });
});
