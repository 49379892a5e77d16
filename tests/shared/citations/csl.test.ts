import { describe, expect, it } from 'vitest';
import { cslLocator, cslTypeOf, excerptToCsl, shortTitle, sourceToCsl, splitArchive } from '@shared/citations/csl';
import { edtfToCslDate } from '@shared/citations/dates';
import { parseName } from '@shared/citations/names';
import { validateCslData } from './csl-data-schema';
import { folioExcerpt, inventory, options, treatise } from './fixtures';

describe('CSL item types', () => {
  // CSL 1.0.2 specification, Appendix III "Types": manuscript, book, document.
  it('maps archival sources to manuscript, printed treatises with a publisher to book, the rest to document', () => {
    expect(cslTypeOf(inventory)).toBe('manuscript');
    expect(cslTypeOf(treatise)).toBe('book');
    expect(cslTypeOf({ ...treatise, publication: null, shelfmark: 'Ms. 12' })).toBe('manuscript');
    expect(cslTypeOf({ sourceType: 'music-preface', publication: { publisher: 'Roger', place: 'Amsterdam', edition: null }, shelfmark: null })).toBe('document');
    expect(cslTypeOf({ sourceType: 'newspaper', publication: null, shelfmark: null })).toBe('document');
  });
});

describe('CSL-JSON of a source', () => {
  const item = sourceToCsl(inventory, options);

  // CSL 1.0.2, Appendix IV "Variables": archive, archive_location, archive-place.
  it('carries archive (holding institution), archive_location (shelfmark) and archive-place', () => {
    expect(item).toMatchObject({ type: 'manuscript', archive: 'Fürstliches Hausarchiv Velmark', 'archive-place': 'Oderstadt', archive_location: 'Loc. 44/7' });
  });

  it('has the permalink with the version, the version, the language and today as accessed', () => {
    expect(item.URL).toBe('https://windway.example/sources/S7K2QX9A/v/3');
    expect(item.version).toBe('3');
    expect(item.language).toBe('de');
    expect(item.accessed).toEqual({ 'date-parts': [[2025, 3, 1]] });
    expect(item.issued).toEqual({ 'date-parts': [[1703, 5, 12]] });
  });

  it('a compiler with no author is the author (Chicago 17 CSL styles print no compiler)', () => {
    expect(item.author).toEqual([{ family: 'Quellmann', given: 'Jobst Anselm' }]);
  });

  it('gives a printed book publisher and place', () => {
    const book = sourceToCsl(treatise, options);
    expect(book).toMatchObject({ type: 'book', publisher: 'Christophe Ballard', 'publisher-place': 'Paris', author: [{ given: 'Jacques-Martin', family: 'Hotteterre' }] });
    expect(book['title-short']).toBe('Principes de la flute traversiere');
  });

  // csl-data.json v1.0 (CSL 1.0.2's input schema): required id and type, no other properties.
  it('validates against the CSL-JSON schema (csl-data.json v1.0)', () => {
    const { item: excerptItem } = excerptToCsl(folioExcerpt, inventory, options);
    expect(validateCslData([item, sourceToCsl(treatise, options), excerptItem])).toEqual([]);
    expect(validateCslData([{ id: 'x', type: 'manuscript', label: 'folio' }])).toEqual(['[0].label: additional property not allowed']);
  });
});

describe('CSL-JSON of an excerpt', () => {
  const { item, cite } = excerptToCsl(folioExcerpt, inventory, options);

  it("cites the source with the excerpt's id, permalink with its version, and its locator", () => {
    expect(item.id).toBe('E4R9WD2C');
    expect(item.URL).toBe('https://windway.example/excerpts/E4R9WD2C/v/2');
    expect(item.version).toBe('2');
    expect(item.title).toBe(inventory.title);
    expect(item.locator).toBe('12v');
    expect(item.custom).toMatchObject({ label: 'folio', sourceId: 'S7K2QX9A' });
    // CSL 1.0.2, "Locators": a locator always comes with a label.
    expect(cite).toEqual({ id: 'E4R9WD2C', locator: '12v', label: 'folio' });
  });

  // CSL 1.0.2 locator terms: page, folio, column; no term for signature or plate (documented choice).
  it('maps locator types to CSL labels', () => {
    expect(cslLocator('page', '23')).toEqual({ label: 'page', locator: '23' });
    expect(cslLocator('folio', '12v-13r')).toEqual({ label: 'folio', locator: '12v–13r' });
    expect(cslLocator('column', '145b')).toEqual({ label: 'column', locator: '145b' });
    expect(cslLocator('signature', 'B3v')).toEqual({ label: 'page', locator: 'sig. B3v' });
    expect(cslLocator('plate', 'IV')).toEqual({ label: 'page', locator: 'pl. IV' });
  });
});

describe('EDTF → CSL dates (CSL 1.0.2 "Date-variables"; EDTF, Library of Congress 2019)', () => {
  it('keeps the precision of a day, month or year', () => {
    expect(edtfToCslDate('1703-05-12')).toEqual({ 'date-parts': [[1703, 5, 12]] });
    expect(edtfToCslDate('1703-05')).toEqual({ 'date-parts': [[1703, 5]] });
    expect(edtfToCslDate('1703')).toEqual({ 'date-parts': [[1703]] });
  });
  it('marks approximate and uncertain dates circa', () => {
    expect(edtfToCslDate('1700~')).toEqual({ 'date-parts': [[1700]], circa: true });
    expect(edtfToCslDate('1700?')).toEqual({ 'date-parts': [[1700]], circa: true });
  });
  it('gives intervals and unspecified digits as two date-parts', () => {
    expect(edtfToCslDate('1700/1725')).toEqual({ 'date-parts': [[1700], [1725]] });
    expect(edtfToCslDate('169X')).toEqual({ 'date-parts': [[1690], [1699]] });
    expect(edtfToCslDate('1700~/1725')).toEqual({ 'date-parts': [[1700], [1725]], circa: true });
  });
  it('writes what date-parts cannot hold as a literal', () => {
    expect(edtfToCslDate('../1760')).toEqual({ literal: 'before 1760' });
    expect(edtfToCslDate('[1667,1668]')?.literal).toMatch(/1667/);
  });
});

describe('names (CSL 1.0.2 "Name-variables")', () => {
  it('reads "Family, Given", "Given Family", particles and institutions', () => {
    expect(parseName('Quantz, Johann Joachim')).toEqual({ family: 'Quantz', given: 'Johann Joachim' });
    expect(parseName('Johann Joachim Quantz')).toEqual({ family: 'Quantz', given: 'Johann Joachim' });
    expect(parseName('Jacob van Eyck')).toEqual({ given: 'Jacob', family: 'Eyck', 'non-dropping-particle': 'van' });
    expect(parseName('Michel de La Barre')).toEqual({ given: 'Michel', family: 'La Barre', 'non-dropping-particle': 'de' });
    expect(parseName('Hofkapelle Oderstadt')).toEqual({ literal: 'Hofkapelle Oderstadt' });
    expect(parseName('Hotteterre')).toEqual({ family: 'Hotteterre' });
  });
  it('splits "Institution, City"', () => {
    expect(splitArchive('British Library, London')).toEqual({ archive: 'British Library', place: 'London' });
    expect(splitArchive('Staatsarchiv')).toEqual({ archive: 'Staatsarchiv' });
  });
  it('shortens long titles for later notes', () => {
    expect(shortTitle('The Compleat Flute-Master: or the whole art of playing')).toBe('The Compleat Flute-Master');
    expect(shortTitle('Short')).toBeUndefined();
  });
});
