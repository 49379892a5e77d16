/**
 * Hostile input: stored as data, rendered inert, refused with the field named.
 * The browser half (rendered pages, the DOM) is tests/e2e/security.test.ts.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { Window } from 'happy-dom';
import { drainAll } from '@search/outbox-worker';
import { anonymous, signedIn, type Client } from '../../support/http';
import { buildExcerpt, buildSource } from '../../support/factories';

export const PAYLOADS = [
  "' OR 1=1 --",
  '"; DROP TABLE sources; --',
  '<script>window.__pwned = 1</script>',
  '<img src=x onerror="window.__pwned = 1">',
  '[x](javascript:window.__pwned=1)',
  '<iframe src="javascript:window.__pwned=1"></iframe>',
  '<a href="data:text/html,<script>window.__pwned=1</script>">y</a>',
  '<svg onload="window.__pwned=1"></svg> {{constructor.constructor("window.__pwned=1")()}}',
];

const source = (p: string) => ({
  title: `Title ${p}`,
  sourceType: 'treatise',
  creators: [{ name: `Creator ${p}`, role: 'author' }],
  dateEdtf: '1702',
  place: `Place ${p}`,
  languages: ['en'],
  holdingInstitution: `Library ${p}`,
  shelfmark: `Shelf ${p}`,
  publication: { publisher: `Publisher ${p}`, place: `Pub place ${p}`, edition: `Edition ${p}` },
  rightsStatement: `Rights ${p}`,
});

const excerpt = (p: string) => ({
  locatorType: 'folio',
  locatorValue: '12v',
  diplomatic: `Diplomatic ${p}`,
  normalised: `Normalised ${p}`,
  translation: `Translation ${p}`,
  translationLanguage: 'en',
  translator: `Translator ${p}`,
  commentary: `Commentary ${p}\n\n${PAYLOADS.join('\n\n')}`,
  topics: [`topic ${p}`.slice(0, 60)],
  mentions: [{ term: `Term ${p}`, language: 'en', sizeSlug: 'alto', certainty: 'probable', note: `Note ${p}` }],
  pitchTags: [{ statement: `Statement ${p}`, aHz: 415, derivation: 'stated', note: `Pitch note ${p}` }],
});

/**
 * What would make HTML active once inserted in a page, found by parsing it as a browser
 * would (happy-dom): script-capable elements, `on*` handlers, script/data URLs.
 */
export function activeHtml(html: string): string[] {
  const window = new Window();
  const container = window.document.createElement('div');
  container.innerHTML = html;
  const found: string[] = [];
  for (const el of container.querySelectorAll('*')) {
    const tag = el.tagName.toLowerCase();
    if (['script', 'iframe', 'object', 'embed', 'svg', 'math', 'img', 'form', 'base', 'link', 'meta', 'frame', 'style'].includes(tag)) found.push(`<${tag}>`);
    for (const attr of el.getAttributeNames()) {
      const value = (el.getAttribute(attr) ?? '').replace(/[\s\u0000-\u001f]/g, '').toLowerCase();
      if (attr.toLowerCase().startsWith('on')) found.push(`<${tag} ${attr}>`);
      if (/^(javascript|data|vbscript):/.test(value)) found.push(`<${tag} ${attr}=${value.slice(0, 20)}>`);
    }
  }
  window.close();
  return found;
}

let contributor: Client;
beforeAll(async () => {
  contributor = (await signedIn('contributor')).client;
});

describe('hostile text is stored as data, verbatim', () => {
  it('the inertness check itself finds active HTML', () => {
    expect(activeHtml('<p>fine <a href="https://example.org">x</a></p>')).toEqual([]);
    for (const bad of ['<img src=x onerror=1>', '<a href=" javascript:x">y</a>', '<script>1</script>', '<p onclick="x">y</p>', '<iframe></iframe>']) {
      expect(activeHtml(bad), bad).not.toEqual([]);
    }
  });

  for (const payload of PAYLOADS) {
    it(`in every text field of a source and an excerpt: ${payload}`, async () => {
      // ASVS 4.0.3 V5.3.4 — parameterised queries: SQL in data stays data, stored verbatim.
      const created = await contributor.post('/api/sources', source(payload));
      expect(created.status, JSON.stringify(created.body)).toBe(201);
      const id = created.body.data.id;
      const readSource = (await contributor.get(`/api/sources/${id}`).expect(200)).body.data;
      const { dateEdtf: _date, ...sourceFields } = source(payload);
      expect(readSource).toMatchObject(sourceFields);

      const added = await contributor.post(`/api/sources/${id}/excerpts`, excerpt(payload));
      expect(added.status, JSON.stringify(added.body)).toBe(201);
      const read = (await contributor.get(`/api/excerpts/${added.body.data.id}`).expect(200)).body.data;
      const { mentions, pitchTags, locatorType: _t, locatorValue: _v, ...plain } = excerpt(payload);
      expect(read).toMatchObject(plain);
      expect(read.mentions[0]).toMatchObject(mentions[0]);
      expect(read.pitchTags[0]).toMatchObject(pitchTags[0]);
      // ASVS V5.3.3 — output encoding / sanitising for the HTML context: the rendered commentary is inert.
      expect(activeHtml(read.commentaryHtml ?? '')).toEqual([]);
      expect(read.commentaryHtml).toContain('Commentary');
      // The sources table is still there and still has the row.
      expect((await contributor.get(`/api/sources/${id}`)).status).toBe(200);
    });
  }

  it('the source list search treats SQL as text (no extra rows)', async () => {
    // ASVS V5.3.4 — the `q` filter of GET /api/sources is a bound LIKE value.
    const reader = await anonymous();
    const control = (await reader.get('/api/sources?q=zzzz-no-such-title').expect(200)).body.total;
    for (const q of ["' OR 1=1 --", "%' OR '1'='1", '%', '_', "\\' OR 1=1 #"]) {
      const res = await reader.get(`/api/sources?q=${encodeURIComponent(`zzzz-no-such-title${q}`)}`);
      expect(res.status).toBe(200);
      expect(res.body.total).toBe(control);
    }
  });
});

describe('body limits and types', () => {
  it('refuses a JSON body over 1 MB with 413 and the error contract', async () => {
    // ASVS V12.1.1 (nearest requirement) — oversized requests refused before they cost memory or storage.
    const client = await anonymous();
    const big = { ...source('big'), rightsStatement: 'x'.repeat(1024 * 1024 + 10) };
    const res = await client.post('/api/sources', big);
    expect(res.status).toBe(413);
    expect(res.body.error).toMatchObject({ code: 'payload_too_large' });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });

  it.each([
    ['a number for the title', { ...source('t'), title: 42 }, 'title'],
    ['an object for the title', { ...source('t'), title: { $gt: '' } }, 'title'],
    ['an array for publication (an object)', { ...source('t'), publication: ['x'] }, 'publication'],
    ['a string for creators (an array)', { ...source('t'), creators: 'Hotteterre' }, 'creators'],
    ['a number for a creator name', { ...source('t'), creators: [{ name: 7, role: 'author' }] }, 'creators.0.name'],
  ])('refuses %s with 400 naming the field', async (_what, body, field) => {
    // ASVS V5.1.4 — structured data strongly typed; V13.2.2 — JSON schema validation before input is processed.
    const res = await contributor.post('/api/sources', body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty([field]);
  });

  it('refuses a string for pitchTags[0].aHz, naming pitchTags.0.aHz', async () => {
    const { data } = (await contributor.post('/api/sources', source('types')).expect(201)).body;
    const body = { ...excerpt('types'), pitchTags: [{ statement: 'a tone below', aHz: '415' }] };
    const res = await contributor.post(`/api/sources/${data.id}/excerpts`, body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['pitchTags.0.aHz']);
  });

  it('refuses a JSON array where an object is expected, and malformed JSON', async () => {
    const res = await contributor.post('/api/sources', [source('array')]);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBeTruthy();
    const bad = await contributor.agent.post('/api/sources').set('X-CSRF-Token', contributor.csrfToken).set('Content-Type', 'application/json').send('{"title": ');
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('bad_request');
  });

  it('refuses unknown fields by name, so nobody sets status, owner or role through a body', async () => {
    // ASVS V5.1.2 — protection against mass assignment.
    const res = await contributor.post('/api/sources', { ...source('mass'), status: 'approved', contributorId: 1, approvedVersion: 1 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['approvedVersion', 'contributorId', 'status']);
    const me = (await contributor.get('/api/auth/me')).body.user;
    const nested = await contributor.post('/api/sources', { ...source('mass'), creators: [{ name: 'A', role: 'author', id: me.id }] });
    expect(nested.status).toBe(400);
    expect(nested.body.error.fields).toHaveProperty(['creators.0.id']);
  });
});

describe('search text cannot change the filter expression', () => {
  let approved: string;
  let draft: string;
  beforeAll(async () => {
    const owner = await signedIn('contributor');
    const pub = await buildSource(owner.user.id, { title: 'Quirinalis approved inventory' });
    approved = (await buildExcerpt(pub, { diplomatic: 'Quirinalis zwo Blockflöten', sizeSlug: 'alto' })).publicId;
    const hidden = await buildSource(owner.user.id, { title: 'Quirinalis draft inventory', status: 'draft' });
    draft = (await buildExcerpt(hidden, { diplomatic: 'Quirinalis secret draft Blockflöten', status: 'draft', sizeSlug: 'alto' })).publicId;
    const { SearchOutbox, Excerpt } = await import('@server/models');
    for (const e of await Excerpt.findAll()) await SearchOutbox.create({ entityType: 'excerpt', entityId: e.id, operation: 'upsert', availableAt: new Date(), lastError: null });
    const drained = await drainAll();
    expect(drained.error).toBeUndefined();
  });

  const hitIds = (body: { hits: { excerptId: string }[] }) => body.hits.map((h) => h.excerptId).sort();

  it('quotes, operators and parentheses in q find no more than the control', async () => {
    // ASVS V5.3.4 — the search filter is a query language; user text is only ever the query string, never part of the filter.
    const visitor = await anonymous();
    const control = (await visitor.get('/api/search?q=Quirinalis').expect(200)).body;
    expect(hitIds(control)).toEqual([approved]);
    for (const q of ['Quirinalis" OR status = draft', 'Quirinalis") OR (visibility = "private', '" OR status = "draft', 'Quirinalis OR visibility != "public"']) {
      const res = await visitor.get(`/api/search?q=${encodeURIComponent(q)}`);
      expect(res.status, q).toBe(200);
      expect(hitIds(res.body), q).not.toContain(draft);
    }
  });

  it('filter parameters accept only known values: an injected size is 400', async () => {
    // ASVS V5.1.3 — positive validation (allow lists) of every filter value.
    const visitor = await anonymous();
    for (const [query, field] of [
      ['size=alto%22%20OR%20status%3D%22draft', 'size.0'],
      ['size=alto)%20OR%20(visibility%20%3D%20%22private%22', 'size.0'],
      ['status=draft', 'status'],
      ['aMin=400%20OR%201%3D1', 'aMin'],
    ]) {
      const res = await visitor.get(`/api/search?q=Quirinalis&${query}`);
      expect(res.status, query).toBe(400);
      expect(res.body.error.fields, query).toHaveProperty([field]);
    }
  });
});

describe('every other HTML the server renders from contributed text is inert', () => {
  it('citations (html), programme notes preview and export, TEI', async () => {
    // ASVS V5.3.3 — output escaping against stored XSS; V5.3.1 — encoding for each interpreter (HTML, XML).
    const owner = await signedIn('contributor');
    const joined = PAYLOADS.join(' ');
    const src = await buildSource(owner.user.id, { title: `Title ${joined}`, creators: [{ name: `Creator ${PAYLOADS[3]}`, role: 'author' }], place: `Place ${PAYLOADS[2]}`, shelfmark: `Shelf ${PAYLOADS[5]}` });
    const ex = await buildExcerpt(src, { diplomatic: `Diplomatic ${joined}`, translation: `Translation ${PAYLOADS[3]}` });
    const visitor = await anonymous();
    for (const style of ['notes', 'author-date']) {
      for (const id of [src.publicId, ex.publicId]) {
        const kind = id.startsWith('S') ? 'sources' : 'excerpts';
        const res = await visitor.get(`/api/${kind}/${id}/cite?format=html&style=${style}`).set('Accept', 'application/json');
        expect(res.status).toBe(200);
        // `items` is CSL-JSON data (text); `data` and `entries` are the HTML the cite panel inserts.
        const html = [res.body.data, ...(res.body.entries ?? []).flatMap((e: Record<string, unknown>) => Object.values(e).filter((v) => typeof v === 'string'))].join('\n');
        expect(html).toContain('Title');
        expect(activeHtml(html), `${kind} ${style}`).toEqual([]);
      }
    }
    const notes = `${joined}\n\nAs the inventory says [@${ex.publicId}, fol. 12v].\n\n<div onclick="window.__pwned=1">raw</div>`;
    const preview = await owner.client.post('/api/programmes/preview', { notesMarkdown: notes });
    expect(preview.status).toBe(200);
    const rendered = [preview.body.data.html, ...preview.body.data.notes.map((n: { html: string }) => n.html), ...preview.body.data.bibliography.map((b: { html: string }) => b.html)].join('\n');
    expect(activeHtml(rendered)).toEqual([]);
    const programme = (await owner.client.post('/api/programmes', { title: `Concert ${PAYLOADS[2]}`, notesMarkdown: notes }).expect(201)).body.data;
    const html = await owner.client.get(`/api/programmes/${programme.id}/export?format=html`).buffer(true).parse((res, done) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => done(null, text));
    });
    expect(html.status).toBe(200);
    // The exported page may carry its own <style>/<meta charset>; nothing that runs code.
    expect(activeHtml(String(html.body)).filter((m) => !/^<\s*(style|meta)/i.test(m))).toEqual([]);
    const tei = await visitor.get(`/api/sources/${src.publicId}/tei`).buffer(true).parse((res, done) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => (text += c));
      res.on('end', () => done(null, text));
    });
    expect(tei.status).toBe(200);
    expect(String(tei.body)).not.toMatch(/<script|<img|<iframe|<svg/i);
    expect(String(tei.body)).toContain('&lt;script&gt;');
  });
});
