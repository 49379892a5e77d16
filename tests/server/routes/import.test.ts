import { describe, expect, it } from 'vitest';
import { anonymous, signedIn } from '../../support/http';
import { approvedSource } from '../citations/support';

const bibtex = `@book{hotteterre1707,
  author = {Hotteterre, Jacques-Martin},
  title = {Principes de la flute traversiere},
  year = {1707},
  publisher = {Christophe Ballard},
  address = {Paris},
  language = {french},
}

@unpublished{inventar1703,
  author = {Quellmann, Jobst Anselm},
  title = {Inventarium der Hofkapelle},
  year = {1703},
  note = {Staatsarchiv},
  language = {de},
}
`;

const ris = ['TY  - MANSCPT', 'AU  - Quellmann, Jobst Anselm', 'TI  - Inventarium der Kammer', 'PY  - 1704', 'PB  - Staatsarchiv Oderstadt', 'AV  - Loc. 9/1', 'LA  - de', 'ER  - ', ''].join('\r\n');

describe('POST /api/import/preview', () => {
  it('maps BibTeX entries to draft source fields, with the line of each entry', async () => {
    const { client } = await signedIn('contributor');
    const res = await client.post('/api/import/preview', { text: bibtex, format: 'bibtex' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const [book, ms] = res.body.data.entries;
    expect(book).toMatchObject({ line: 1, key: 'hotteterre1707', errors: null, duplicates: [] });
    expect(book.fields).toMatchObject({
      title: 'Principes de la flute traversiere', sourceType: 'treatise', dateEdtf: '1707', languages: ['fr'],
      creators: [{ name: 'Hotteterre, Jacques-Martin', role: 'author' }], publication: { publisher: 'Christophe Ballard', place: 'Paris' },
    });
    expect(ms).toMatchObject({ line: 10, fields: { sourceType: 'other', dateEdtf: '1703', languages: ['de'] } });
  });

  it('reads an uploaded RIS file (RIS Format Specifications: AV location in archives)', async () => {
    const { client } = await signedIn('contributor');
    const res = await client.agent.post('/api/import/preview').set('X-CSRF-Token', client.csrfToken).attach('file', Buffer.from(ris), 'export.ris');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.data.format).toBe('ris');
    expect(res.body.data.entries[0].fields).toMatchObject({ title: 'Inventarium der Kammer', holdingInstitution: 'Staatsarchiv Oderstadt', shelfmark: 'Loc. 9/1', dateEdtf: '1704' });
  });

  it('warns of likely duplicates: same title, date and shelfmark', async () => {
    const existing = await approvedSource({ title: 'Inventarium der Kammer', dateEdtf: '1704', shelfmark: 'Loc. 9/1' });
    const { client } = await signedIn('contributor');
    const res = await client.post('/api/import/preview', { text: ris + ris, format: 'ris' });
    const [first, second] = res.body.data.entries;
    expect(first.duplicates).toMatchObject([{ id: existing.publicId }]);
    expect(second.duplicates.map((d: { message: string }) => d.message)).toContain('Same title, date and shelfmark as entry 1 of this import.');
  });

  it('reports per-entry validation errors (a missing date)', async () => {
    const { client } = await signedIn('contributor');
    const res = await client.post('/api/import/preview', { text: '@misc{x, title = {Undated list}}', format: 'bibtex' });
    expect(res.body.data.entries[0].errors).toMatchObject({ dateEdtf: expect.any(String), languages: expect.any(String) });
  });

  it('answers 400 with the line for malformed BibTeX and RIS', async () => {
    const { client } = await signedIn('contributor');
    const bad = await client.post('/api/import/preview', { text: '@book{a,\n  title = {X},\n  year = 1700\n', format: 'bibtex' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/^Line 4:/);
    const badRis = await client.post('/api/import/preview', { text: 'TY  - BOOK\nTI  - X\nwrapped line\nER  - \n', format: 'ris' });
    expect(badRis.status).toBe(400);
    expect(badRis.body.error.fields.text).toMatch(/^Line 3:/);
    const noEnd = await client.post('/api/import/preview', { text: 'TY  - BOOK\nTI  - X\n', format: 'ris' });
    expect(noEnd.body.error.message).toMatch(/line 1 has no ER/);
  });

  it('is for contributors', async () => {
    expect((await (await anonymous()).post('/api/import/preview', { text: bibtex })).status).toBe(401);
    expect((await (await signedIn('reader')).client.post('/api/import/preview', { text: bibtex })).status).toBe(403);
  });
});

describe('POST /api/import', () => {
  it('creates draft sources with a revision each, in one transaction', async () => {
    const { client, user } = await signedIn('contributor');
    const preview = await client.post('/api/import/preview', { text: bibtex, format: 'bibtex' });
    const entries = preview.body.data.entries.map((e: { fields: object }) => e.fields);
    const res = await client.post('/api/import', { entries });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const { Source, Revision } = await import('@server/models');
    const ids = res.body.data.created.map((c: { id: string }) => c.id);
    const rows = await Source.findAll({ where: { publicId: ids } });
    expect(rows.map((r) => [r.status, r.contributorId, r.version, r.dateLabel])).toEqual(
      expect.arrayContaining([['draft', user.id, 1, '1707'], ['draft', user.id, 1, '1703']]),
    );
    expect(await Revision.count({ where: { entityType: 'source', entityId: rows.map((r) => r.id) } })).toBe(2);
  });

  it('imports nothing when one entry is invalid (all or nothing)', async () => {
    const { client, user } = await signedIn('contributor');
    const good = { title: 'A good one', sourceType: 'other', dateEdtf: '1700', languages: ['en'] };
    const res = await client.post('/api/import', { entries: [good, { ...good, dateEdtf: 'not a date' }] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['entries.1.dateEdtf']).toBeTruthy();
    const { Source } = await import('@server/models');
    expect(await Source.count({ where: { contributorId: user.id } })).toBe(0);
  });
});
