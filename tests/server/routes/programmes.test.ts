import { describe, expect, it, beforeAll } from 'vitest';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { anonymous, signedIn } from '../../support/http';
import { approvedExcerpt, approvedSource, printedTreatise } from '../citations/support';

let inventory: { id: number; publicId: string };
let e1: string;
let e2: string;
let e3: string;
let book: string;
let letters: string;
let draft: string;

beforeAll(async () => {
  inventory = await approvedSource();
  e1 = (await approvedExcerpt(inventory, 'folio', '12v')).publicId;
  e2 = (await approvedExcerpt(inventory, 'folio', '14r')).publicId;
  book = (await approvedSource(printedTreatise)).publicId;
  const other = await approvedSource({ title: 'Letter to the Kapellmeister', sourceType: 'letter', creators: [{ name: 'Anna Bach', role: 'author' }], dateEdtf: '1725-02-10', shelfmark: 'Ms. 4', holdingInstitution: 'Bach-Archiv, Leipzig', languages: ['de'] });
  letters = other.publicId;
  e3 = (await approvedExcerpt(other, 'page', '3')).publicId;
  draft = (await approvedExcerpt(inventory, 'folio', '20r', 'draft')).publicId;
});

const asText = (r: NodeJS.ReadableStream, done: (e: Error | null, body: string) => void) => {
  let text = '';
  r.setEncoding('utf8');
  r.on('data', (c: string) => (text += c));
  r.on('end', () => done(null, text));
};

const piece = { title: 'Sonata in F', composer: 'G. F. Handel', key: 'F major', sizeSlug: 'voice-flute', aHz: 415, lowest: 'D4', highest: 'E6', fingering: 'F' as const };

function notesText() {
  return [
    `The chapel owned four recorders [@${e1}], one of them in D [@${book}, p. 12].`,
    '',
    `Later inventories repeat this [@${e1}, fol. 13r; @${letters}] and a letter agrees [see @${e3}].`,
    '',
    `Once more the inventory [@${e2}] and a bad one [@E0000000] and an unclosed [@${e1}, fol. 2r`,
  ].join('\n');
}

async function newProgramme(client: Awaited<ReturnType<typeof signedIn>>['client'], extra: object = {}) {
  const res = await client.post('/api/programmes', { title: 'Music for the Oderstadt chapel', performanceDate: '2025-11-08', venue: 'St Cecilia’s Hall', performers: [{ name: 'Ana Ruiz', role: 'recorders' }], pieces: [piece], notesMarkdown: notesText(), ...extra });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.data as { id: string; version: number };
}

describe('programmes', () => {
  it('belong to their owner: others get 404, anonymous 401', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    expect((await client.get('/api/programmes')).body.data.map((p: { id: string }) => p.id)).toContain(programme.id);
    const other = (await signedIn('editor')).client;
    expect((await other.get(`/api/programmes/${programme.id}`)).status).toBe(404);
    expect((await other.patch(`/api/programmes/${programme.id}`, { version: 1, title: 'x' })).status).toBe(404);
    expect((await (await anonymous()).get(`/api/programmes/${programme.id}`)).status).toBe(401);
  });

  it('updates with optimistic locking and refuses an unknown style', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    const ok = await client.patch(`/api/programmes/${programme.id}`, { version: 1, venue: 'Hall 2' });
    expect(ok.body.data).toMatchObject({ venue: 'Hall 2', version: 2 });
    expect((await client.patch(`/api/programmes/${programme.id}`, { version: 1, venue: 'x' })).status).toBe(409);
    const bad = await client.patch(`/api/programmes/${programme.id}`, { version: 2, citationStyle: 'nope' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.citationStyle).toMatch(/Unknown style/);
  });

  it('renders markers as numbered footnotes in order of use, later citations short, a sorted deduplicated bibliography, and reports problems', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    const res = await client.post(`/api/programmes/${programme.id}/preview`);
    const { notes, bibliography, problems, html } = res.body.data;
    expect(notes.map((n: { number: number }) => n.number)).toEqual([1, 2, 3, 4, 5]);
    // CMOS 17 §14.20 (from memory): the first note on a source in full…
    expect(notes[0].text).toMatch(/^Jobst Anselm Quellmann, “Inventarium der Instrumente der Hofkapelle” \(May 12, 1703\), fol\. 12v, Loc\. 44\/7/);
    expect(notes[1].text).toMatch(/^Jacques-Martin Hotteterre, .*\(Paris: Christophe Ballard, 1707\), 12/);
    // …and later ones in short form (CMOS 17 §14.29): the inventory again, with the marker's own folio.
    expect(notes[2].text).toMatch(/^Quellmann, “Inventarium der Instrumente der Hofkapelle,” fol\. 13r; Anna Bach, “Letter to the Kapellmeister”/);
    expect(notes[3].text).toMatch(/^See Bach, “Letter to the Kapellmeister,” 3\.$/);
    expect(notes[4].text).toBe('Quellmann, “Inventarium der Instrumente der Hofkapelle,” fol. 14r.');
    // One entry per source, sorted by author (two excerpts of the inventory → one entry).
    expect(bibliography.map((b: { text: string }) => b.text.split('.')[0])).toEqual(['Bach, Anna', 'Hotteterre, Jacques-Martin', 'Quellmann, Jobst Anselm']);
    expect(html).toContain('<sup class="footnote-ref"><a href="#fn-1" id="fnref-1">1</a></sup>');
    expect(problems).toMatchObject([
      { kind: 'unknown-id', key: 'E0000000', line: 5 },
      { kind: 'malformed', line: 5, message: expect.stringMatching(/closing bracket/) },
    ]);
    expect(html).toMatch(/<mark class="citation-problem" title="E0000000 was not found[^"]*">\[@E0000000\]<\/mark>/);
  });

  it('reports a draft excerpt as unknown (not public) in the live preview', async () => {
    const { client } = await signedIn('reader');
    const res = await client.post('/api/programmes/preview', { notesMarkdown: `Draft [@${draft}].`, citationStyle: 'notes' });
    expect(res.body.data.problems).toMatchObject([{ kind: 'unknown-id', key: draft }]);
    expect(res.body.data.notes).toEqual([]);
  });

  it('exports print-ready HTML with the pieces’ reckoner results', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    const res = await client.get(`/api/programmes/${programme.id}/export?format=html`);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.text).toContain('@media print');
    // Handbook references (CP): F major on a D-size with F-fingering is fingered a minor third up: A♭ major, four flats.
    expect(res.text).toMatch(/F-fingering: fingered in Ab major \(4 flats\) — cross-fingered key/);
    expect(res.text).toContain('<li id="fn-5">');
    expect(res.text).toContain('<section class="bibliography">');
  });

  it('exports DOCX with real footnotes in word/footnotes.xml', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    const res = await client.get(`/api/programmes/${programme.id}/export?format=docx`).buffer(true).parse((r, done) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    const dir = mkdtempSync(join(tmpdir(), 'ww-docx-'));
    const file = join(dir, 'p.docx');
    writeFileSync(file, res.body as Buffer);
    const footnotes = execFileSync('unzip', ['-p', file, 'word/footnotes.xml']).toString('utf8');
    const documentXml = execFileSync('unzip', ['-p', file, 'word/document.xml']).toString('utf8');
    // ECMA-376 Part 1 §17.11 (from memory): w:footnote elements referenced by w:footnoteReference.
    const ids = [...footnotes.matchAll(/<w:footnote [^>]*w:id="(\d+)"/g)].map((m) => Number(m[1])).filter((id) => id > 0);
    expect(ids).toEqual([1, 2, 3, 4, 5]);
    expect(footnotes).toContain('fol. 12v');
    expect(footnotes).toContain('Principes de la flute traversiere');
    expect([...documentXml.matchAll(/<w:footnoteReference w:id="(\d+)"\/>/g)].map((m) => Number(m[1]))).toEqual([1, 2, 3, 4, 5]);
    expect(documentXml).toContain('Bibliography');
  });

  it('exports Markdown with footnotes and a .bib of every cited id', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    const md = await client.get(`/api/programmes/${programme.id}/export?format=markdown`).buffer(true).parse(asText as never);
    expect(md.headers['content-type']).toMatch(/^text\/markdown/);
    md.text = md.body as string;
    expect(md.text).toMatch(/four recorders \[\^1\], one of them in D \[\^2\]\./);
    expect(md.text).toMatch(/^\[\^1\]: Jobst Anselm Quellmann/m);
    expect(md.text).toContain('## Bibliography');
    const bib = await client.get(`/api/programmes/${programme.id}/export?format=bib`);
    for (const id of [e1, book, letters, e3, e2]) expect(bib.text).toContain(`{${id},`);
  });

  it('shares read-only by an unguessable link, rotates and revokes it', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client);
    const shared = await client.post(`/api/programmes/${programme.id}/share`);
    const token = shared.body.data.sharePath.replace('/p/', '');
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const visitor = await anonymous();
    const seen = await visitor.get(`/api/shared-programmes/${token}`);
    expect(seen.body.data).toMatchObject({ title: 'Music for the Oderstadt chapel', sharePath: null, ownerName: expect.any(String) });
    const rotated = (await client.post(`/api/programmes/${programme.id}/share`)).body.data.sharePath.replace('/p/', '');
    expect(rotated).not.toBe(token);
    expect((await visitor.get(`/api/shared-programmes/${token}`)).status).toBe(404);
    await client.delete(`/api/programmes/${programme.id}/share`).expect(200);
    expect((await visitor.get(`/api/shared-programmes/${rotated}`)).status).toBe(404);
  });

  it('deletes', async () => {
    const { client } = await signedIn('reader');
    const programme = await newProgramme(client, { pieces: [], notesMarkdown: '' });
    await client.delete(`/api/programmes/${programme.id}`).expect(204);
    expect((await client.get(`/api/programmes/${programme.id}`)).status).toBe(404);
  });
});
