import { describe, expect, it, beforeAll } from 'vitest';
import { anonymous, signedIn } from '../../support/http';
import { approvedExcerpt, approvedSource, printedTreatise } from '../citations/support';
import { validateCslData } from '../../shared/citations/csl-data-schema';

let excerptId: string;
let sourceId: string;
let bookId: string;
let draftExcerptId: string;

beforeAll(async () => {
  const source = await approvedSource();
  sourceId = source.publicId;
  excerptId = (await approvedExcerpt(source, 'folio', '12v')).publicId;
  draftExcerptId = (await approvedExcerpt(source, 'page', '3', 'draft')).publicId;
  bookId = (await approvedSource(printedTreatise)).publicId;
});

describe('GET /api/excerpts/:id/cite', () => {
  it('exports BibTeX as text/plain, as a download when asked', async () => {
    const client = await anonymous();
    const res = await client.get(`/api/excerpts/${excerptId}/cite?format=bibtex&download=1`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/plain/);
    expect(res.headers['content-disposition']).toBe(`attachment; filename=windway-${excerptId}.bib`);
    // Patashnik, BibTeXing (1988): @unpublished needs author, title, note.
    expect(res.text).toMatch(new RegExp(`^@unpublished\\{${excerptId},`));
    expect(res.text).toMatch(/note = \{fol\. 12v, Loc\. 44\/7,/);
  });

  it('exports RIS with TY first and ER last (RIS Format Specifications, 2011)', async () => {
    const res = await (await anonymous()).get(`/api/excerpts/${excerptId}/cite?format=ris`);
    const lines = res.text.trimEnd().split('\r\n');
    expect(lines[0]).toBe('TY  - MANSCPT');
    expect(lines[lines.length - 1]).toBe('ER  -');
  });

  it('exports CSL-JSON that validates against csl-data.json v1.0, with the version in the permalink', async () => {
    const res = await (await anonymous()).get(`/api/excerpts/${excerptId}/cite?format=csl-json`);
    expect(res.headers['content-type']).toMatch(/^application\/vnd\.citationstyles\.csl\+json/);
    const items = JSON.parse(res.text);
    expect(validateCslData(items)).toEqual([]);
    expect(items[0]).toMatchObject({ id: excerptId, type: 'manuscript', locator: '12v', version: '1' });
    expect(items[0].URL).toMatch(new RegExp(`/excerpts/${excerptId}/v/1$`));
  });

  it('answers JSON with the note, short note and bibliography entry when asked for JSON', async () => {
    const res = await (await anonymous()).get(`/api/excerpts/${excerptId}/cite?format=text&style=notes`).set('Accept', 'application/json');
    expect(res.status).toBe(200);
    expect(res.body.style).toBe('notes');
    expect(res.body.entries[0].note).toMatch(/fol\. 12v, Loc\. 44\/7, Fürstliches Hausarchiv Velmark, Oderstadt/);
    expect(res.body.entries[0].bibliography).toMatch(/^Quellmann, Jobst Anselm\./);
    expect(res.body.data).toMatch(/^Notes\n1\. Jobst Anselm Quellmann/);
  });

  it('formats HTML in any style from the list, by its id', async () => {
    const res = await (await anonymous()).get(`/api/excerpts/${excerptId}/cite?format=html&style=chicago-note-bibliography`);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.text).toContain('<section class="csl-bibliography">');
  });

  it('refuses an unknown style or format with a 400', async () => {
    const client = await anonymous();
    const style = await client.get(`/api/excerpts/${excerptId}/cite?format=text&style=not-a-style`);
    expect(style.status).toBe(400);
    expect(style.body.error.fields.style).toMatch(/Unknown style/);
    const format = await client.get(`/api/excerpts/${excerptId}/cite?format=endnote`);
    expect(format.status).toBe(400);
    expect(format.body.error.fields.format).toBeTruthy();
  });

  it('answers 404 for drafts, unknown ids, unapproved versions and the wrong kind', async () => {
    const client = await anonymous();
    expect((await client.get(`/api/excerpts/${draftExcerptId}/cite`)).status).toBe(404);
    expect((await client.get('/api/excerpts/E0000000/cite')).status).toBe(404);
    expect((await client.get(`/api/excerpts/${excerptId}/cite?version=2`)).status).toBe(404);
    expect((await client.get(`/api/sources/${excerptId}/cite`)).status).toBe(404);
  });
});

describe('an earlier approved version', () => {
  it('is cited from its revision, the current one from the row', async () => {
    const source = await approvedSource();
    const { client: editor, user } = await signedIn('editor');
    // Version 1 as an editor's review approved it (the factory writes the row, not the review).
    const { Review } = await import('@server/models');
    await Review.create({ entityType: 'source', entityId: source.id, version: 1, editorId: user.id, decision: 'approve', comment: null, fieldComments: [] });
    const renamed = 'Inventarium der Blasinstrumente der Hofkapelle';
    const edit = await editor.patch(`/api/sources/${source.publicId}`, { version: 1, title: renamed, publish: true, reason: 'Title as on the cover' });
    expect(edit.status).toBe(200);
    const anyone = await anonymous();
    const cite = async (query: string) => JSON.parse((await anyone.get(`/api/sources/${source.publicId}/cite?format=csl-json${query}`)).text)[0];
    expect(await cite('&version=1')).toMatchObject({ title: source.title, version: '1' });
    expect(await cite('')).toMatchObject({ title: renamed, version: '2' });
  });
});

describe('GET /api/sources/:id/cite', () => {
  it('cites a printed book (CMOS 17 book form; BibTeX @book per Patashnik)', async () => {
    const client = await anonymous();
    const text = await client.get(`/api/sources/${bookId}/cite?format=text&style=notes`).set('Accept', 'application/json');
    expect(text.body.entries[0].note).toMatch(/^Jacques-Martin Hotteterre, Principes de la flute traversiere.* \(Paris: Christophe Ballard, 1707\)/);
    const bib = await client.get(`/api/sources/${bookId}/cite?format=bibtex`);
    expect(bib.text).toMatch(/^@book\{/);
    expect(bib.text).toMatch(/publisher = \{Christophe Ballard\}/);
  });
});

describe('POST /api/cite', () => {
  it('exports many ids at once, in the given order, and names ids that cannot be cited', async () => {
    const client = await anonymous();
    const res = await client.post('/api/cite', { ids: [excerptId, bookId, sourceId], format: 'text', style: 'author-date' }).set('Accept', 'application/json');
    expect(res.status).toBe(200);
    expect(res.body.entries.map((e: { id: string }) => e.id)).toEqual([excerptId, bookId, sourceId]);
    expect(res.body.entries[0].citation).toBe('(Quellmann 1703, fol. 12v)');
    const bad = await client.post('/api/cite', { ids: [excerptId, draftExcerptId], format: 'bibtex' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['ids.1']).toMatch(/not found or is not public/);
  });
});

describe('GET /api/cite/styles', () => {
  it('lists notes and author-date first, then the installed styles', async () => {
    const { client } = await signedIn('reader');
    const res = await client.get('/api/cite/styles');
    expect(res.body.data.slice(0, 2)).toEqual([
      { id: 'notes', title: expect.stringMatching(/Chicago/), kind: 'note' },
      { id: 'author-date', title: expect.stringMatching(/Chicago/), kind: 'in-text' },
    ]);
  });
});
