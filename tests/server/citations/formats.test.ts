import { describe, expect, it } from 'vitest';
import { excerptToCsl, sourceToCsl } from '@shared/citations/csl';
import { formatCitations, listStyles, parseBibliographic, renderClusters, toBibtex, toRis, useStyle } from '@server/services/citations';
import { folioExcerpt, inventory, options, treatise } from '../../shared/citations/fixtures';

const manuscript = excerptToCsl(folioExcerpt, inventory, options);
const book = { item: sourceToCsl(treatise, options), cite: { id: treatise.publicId } };

/** Fields of a BibTeX entry: `@type{key,` then `name = {value},` lines. */
function bibtexEntries(text: string) {
  return [...text.matchAll(/@(\w+)\{([^,]+),\n([\s\S]*?)\n\}/g)].map(([, type, key, body]) => ({
    type,
    key,
    fields: Object.fromEntries([...body.matchAll(/^\s*([\w-]+) = \{(.*)\},?$/gm)].map(([, name, value]) => [name, value])),
  }));
}

describe('BibTeX', () => {
  const entries = bibtexEntries(toBibtex([manuscript, book]));

  // Patashnik, BibTeXing (1988), §3.1: unpublished requires author, title, note.
  it('writes a manuscript as @unpublished with author, title and a note carrying locator, shelfmark, archive and place', () => {
    const ms = entries.find((e) => e.key === 'E4R9WD2C')!;
    expect(ms.type).toBe('unpublished');
    expect(ms.fields.author).toBe('Quellmann, Jobst Anselm');
    expect(ms.fields.title).toBeTruthy();
    // citation-js writes ASCII-only BibTeX (LaTeX accents), as classic BibTeX expects.
    expect(ms.fields.note).toBe('fol. 12v, Loc. 44/7, F{\\" u}rstliches Hausarchiv Velmark, Oderstadt');
  });

  // Patashnik, BibTeXing (1988), §3.1: book requires author or editor, title, publisher, year.
  it('writes a printed treatise as @book with author, title, publisher and year', () => {
    const b = entries.find((e) => e.key === 'S3M8ZT4B')!;
    expect(b.type).toBe('book');
    for (const field of ['author', 'title', 'publisher', 'year']) expect(b.fields[field], field).toBeTruthy();
    expect(b.fields.year).toBe('1707');
    expect(b.fields.address).toBe('Paris');
  });

  it('parses back through citation-js into the same CSL-JSON fields', () => {
    const back = parseBibliographic(toBibtex([manuscript, book]), 'bibtex');
    const ms = back.find((e) => e.id === 'E4R9WD2C')!;
    expect(ms).toMatchObject({ type: 'manuscript', title: manuscript.item.title, author: manuscript.item.author, issued: manuscript.item.issued, URL: manuscript.item.URL });
    const b = back.find((e) => e.id === 'S3M8ZT4B')!;
    expect(b).toMatchObject({ type: 'book', title: book.item.title, author: book.item.author, issued: book.item.issued, publisher: 'Christophe Ballard', 'publisher-place': 'Paris' });
  });

  it('exports an anonymous manuscript as @misc (Patashnik: unpublished requires an author; misc requires nothing)', () => {
    const anonymous = excerptToCsl(folioExcerpt, { ...inventory, creators: [] }, options);
    expect(bibtexEntries(toBibtex([anonymous]))[0].type).toBe('misc');
  });
});

describe('RIS', () => {
  const ris = toRis([manuscript, book]);
  const records = ris.replace(/\r\n$/, '').split('\r\n\r\n');

  // RIS Format Specifications (2011): TY first, ER last, "XX  - " tags; MANSCPT and BOOK types.
  it('starts each record with TY and ends it with ER, every line a "XX  - " tag', () => {
    expect(records).toHaveLength(2);
    for (const record of records) {
      const lines = record.split('\r\n');
      expect(lines[0]).toMatch(/^TY {2}- /);
      expect(lines[lines.length - 1]).toBe('ER  - ');
      for (const line of lines) expect(line).toMatch(/^[A-Z][A-Z0-9] {2}- /);
    }
    expect(records[0]).toContain('TY  - MANSCPT');
    expect(records[1]).toContain('TY  - BOOK');
    expect(records[0]).toContain('AV  - Loc. 44/7');
    expect(records[0]).toContain('N1  - fol. 12v, Loc. 44/7');
  });

  it('round-trips type, title, authors, date and shelfmark', () => {
    const back = parseBibliographic(ris, 'ris');
    expect(back[0]).toMatchObject({ type: 'manuscript', title: manuscript.item.title, author: manuscript.item.author, issued: manuscript.item.issued, archive_location: 'Loc. 44/7', archive: 'Fürstliches Hausarchiv Velmark' });
    expect(back[1]).toMatchObject({ type: 'book', title: book.item.title, publisher: 'Christophe Ballard' });
  });
});

describe('styles', () => {
  it('lists Windway names first and the Debian styles by id, with their kind', () => {
    const styles = listStyles();
    expect(styles[0]).toMatchObject({ id: 'notes', kind: 'note' });
    expect(styles[1]).toMatchObject({ id: 'author-date', kind: 'in-text' });
    expect(styles.find((s) => s.id === 'chicago-note-bibliography')).toMatchObject({ kind: 'note', title: 'Chicago Manual of Style 17th edition (note)' });
    expect(styles.length).toBeGreaterThan(100);
  });

  it('refuses an unknown style instead of falling back to APA', () => {
    expect(() => useStyle('no-such-style')).toThrow(/Unknown citation style/);
  });
});

describe('notes style (CMOS 17 §§14.221–14.231, manuscript collections)', () => {
  const { entries } = formatCitations([manuscript, book], 'text', 'notes');

  // CMOS 17 §14.232 note form: item, date, folio, shelfmark/collection, repository, place.
  it('orders a manuscript note: item, date, folio, shelfmark, repository, place', () => {
    const note = entries![0].note!;
    const order = ['Jobst Anselm Quellmann', 'Inventarium der Instrumente der Hofkapelle', 'May 12, 1703', 'fol. 12v', 'Loc. 44/7', 'Fürstliches Hausarchiv Velmark', 'Oderstadt'];
    const positions = order.map((part) => note.indexOf(part));
    expect(positions.every((p) => p >= 0), note).toBe(true);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
    expect(note).toContain('https://windway.example/excerpts/E4R9WD2C/v/2');
  });

  // CMOS 17 §14.229 (from memory): folio locators "fol. 12v", r/v without a full stop.
  // CMOS 17 §14.29 short form: author's surname, short title, locator.
  it('writes the folio locator as fol. 12v and a later note in short form', () => {
    expect(entries![0].note).toMatch(/fol\. 12v,/);
    expect(entries![0].shortNote).toBe('Quellmann, “Inventarium der Instrumente der Hofkapelle,” fol. 12v.');
  });

  // CMOS 17 §14.100 book note (from memory): Author, Title (Place: Publisher, Year); bibliography: Author inverted.
  it('formats a printed book in the note and the bibliography', () => {
    expect(entries![1].note).toBe('Jacques-Martin Hotteterre, Principes de la flute traversiere, ou flute d’Allemagne; de la flute a bec, ou flute douce, et du haut-bois (Paris: Christophe Ballard, 1707), https://windway.example/sources/S3M8ZT4B/v/1.');
    expect(entries![1].bibliography).toMatch(/^Hotteterre, Jacques-Martin\. Principes de la flute traversiere.*\. Paris: Christophe Ballard, 1707\./);
    expect(entries![0].bibliography).toMatch(/^Quellmann, Jobst Anselm\. “Inventarium der Instrumente der Hofkapelle,” May 12, 1703\. Loc\. 44\/7\. Fürstliches Hausarchiv Velmark\. Oderstadt\./);
  });

  it('author-date gives the citation with its locator and a reference list', () => {
    const { entries: ad } = formatCitations([manuscript], 'text', 'author-date');
    expect(ad![0].citation).toBe('(Quellmann 1703, fol. 12v)');
    expect(ad![0].bibliography).toMatch(/^Quellmann, Jobst Anselm\. 1703\./);
  });

  it('labels signature and plate locators as written (sig., pl.)', () => {
    const { texts } = renderClusters([manuscript.item], [{ items: [{ id: manuscript.item.id, locator: 'sig. B3v', label: 'page' }], noteIndex: 1 }], 'notes', 'text');
    expect(texts[0]).toMatch(/, sig\. B3v,/);
  });

  it('follows a change of the item at once (formatted results are cached by their content)', () => {
    const before = formatCitations([manuscript], 'text', 'notes').entries![0].note!;
    const renamed = { ...manuscript, item: { ...manuscript.item, title: 'Inventarium der Blasinstrumente' } };
    const after = formatCitations([renamed], 'text', 'notes').entries![0].note!;
    expect(before).toContain('Inventarium der Instrumente der Hofkapelle');
    expect(after).toContain('Inventarium der Blasinstrumente');
    expect(formatCitations([manuscript], 'text', 'notes').entries![0].note).toBe(before);
  });
});
