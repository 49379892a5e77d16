import { beforeAll, describe, expect, it } from 'vitest';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '@server/db';
import { resetConfigCache } from '@server/config';
import { freePort } from '@server/cli/mariadb';
import { resetSearchClient } from '@search/client';
import { refreshSynonyms } from '@search/settings';
import type { SearchResponse } from '@shared/search/schema';
import { anonymous, signedIn } from '../support/http';
import { makeExcerpt, makeSource, syncSearch } from './catalogue-factory';

type Client = Awaited<ReturnType<typeof anonymous>>;
const search = async (client: Client, query: string): Promise<SearchResponse> => (await client.get(`/api/search?${query}`).expect(200)).body;
const ids = (r: SearchResponse) => r.hits.map((h) => h.excerptId).sort();

let reader: Client, editor: Client, owner: Client, otherContributor: Client, visitor: Client;
const e: Record<string, string> = {};

beforeAll(async () => {
  const o = await signedIn('contributor');
  owner = o.client;
  otherContributor = (await signedIn('contributor')).client;
  reader = (await signedIn('reader')).client;
  editor = (await signedIn('editor')).client;
  visitor = await anonymous();

  const treatise = await makeSource({ contributorId: o.user.id, title: 'Principes de la flûte traversière', languages: ['fr'], dateEdtf: '1707', place: 'Paris' });
  const tutor = await makeSource({ contributorId: o.user.id, title: 'The Compleat Flute-Master', sourceType: 'tutor', dateEdtf: '1695', languages: ['en'] });
  const inventory = await makeSource({ contributorId: o.user.id, title: 'Inventar der Hofkapelle', sourceType: 'inventory', dateEdtf: '1740/1750', languages: ['de'] });
  e.flute = (await makeExcerpt(treatise, {
    diplomatic: 'La flûte traversière se tient de côté, et la flûte à bec droite.',
    mentions: [{ term: 'flûte traversière', sizeSlug: 'flute-one-keyed', language: 'fr' }, { term: 'Schnabelflöte', sizeSlug: 'alto', language: 'de' }],
    pitch: [392],
  })).publicId;
  e.treble = (await makeExcerpt(tutor, {
    diplomatic: 'The treble recorder <script>alert(1)</script> is the common flute of our time & sounds sweetly.',
    mentions: [{ term: 'common flute', sizeSlug: 'alto' }],
    pitch: [415],
  })).publicId;
  e.voice = (await makeExcerpt(tutor, {
    diplomatic: 'A recorder in D, which some call the voice flute, plays with the oboes.',
    mentions: [{ term: 'voice flute', sizeSlug: 'voice-flute' }],
    pitch: [415, 403],
  })).publicId;
  e.bass = (await makeExcerpt(inventory, {
    diplomatic: 'Zwei Bassblockflöten und ein Tenor, im Kammerton.',
    mentions: [{ term: 'Bassblockflöte', sizeSlug: 'bass', language: 'de' }, { term: 'Tenor', sizeSlug: 'tenor', language: 'de' }],
    pitch: [440],
  })).publicId;
  e.draft = (await makeExcerpt(tutor, { diplomatic: 'An unpublished recorder passage in draft', status: 'draft', mentions: [{ term: 'recorder', sizeSlug: 'tenor' }] })).publicId;
  await syncSearch();
  await refreshSynonyms();
});

describe('GET /api/search', () => {
  it('answers the contract shape with highlighted, escaped snippets', async () => {
    const res = await search(visitor, 'q=treble');
    expect(Object.keys(res).sort()).toEqual(['facets', 'hits', 'page', 'perPage', 'processingTimeMs', 'total']);
    // The alto of the French treatise matches too: "treble" is one of the alto's names (sizeNames).
    expect(ids(res)).toEqual([e.flute, e.treble].sort());
    const hit = res.hits[0];
    expect(hit).toMatchObject({ excerptId: e.treble, sourceTitle: 'The Compleat Flute-Master', locator: 'fol. 12v', sizes: ['alto'], aHz: [415], dateLabel: expect.any(String), sourceType: 'tutor', languages: ['en'] });
    expect(hit.snippet).toContain('<mark>treble</mark>');
    expect(hit.snippet).toContain('&lt;script&gt;');
    expect(hit.snippet).toContain('&amp;');
    expect(hit.snippet.replace(/<\/?mark>/g, '')).not.toMatch(/[<>]/);
  });

  it('shows the public approved material only, a contributor their own drafts, an editor everything', async () => {
    const all = 'q=recorder';
    expect(ids(await search(visitor, all))).not.toContain(e.draft);
    expect(ids(await search(reader, all))).not.toContain(e.draft);
    expect(ids(await search(otherContributor, all))).not.toContain(e.draft);
    expect(ids(await search(owner, all))).toContain(e.draft);
    expect(ids(await search(editor, all))).toContain(e.draft);
    expect((await search(visitor, '')).total).toBe(4);
    expect((await search(editor, '')).total).toBe(5);
  });

  it.each([
    'q=%22%20OR%20visibility%20%3D%20%22draft',
    'q=recorder%22)%20OR%20(visibility%20%3D%20draft',
    'q=(draft)%20OR%20status',
    "q='%20OR%201%3D1%20--",
  ])('finds nothing extra for filter-like text in q (%s)', async (query) => {
    const res = await search(visitor, query);
    expect(ids(res)).not.toContain(e.draft);
    expect(res.hits.every((h) => h.status === 'approved')).toBe(true);
  });

  it.each([
    ['size=alto%22)%20OR%20(status%20%3D%20draft', 'size.0'],
    ['lang=en%22%20OR%20visibility%20%3D%20%22draft', 'lang.0'],
    ['type=treatise%20OR%20visibility%20%3D%20draft', 'type.0'],
    ['from=1600%20OR%201', 'from'],
    ['aMin=abc', 'aMin'],
    ['perPage=500', 'perPage'],
    ['from=1750&to=1700', 'to'],
    ['sort=status', 'sort'],
    ['visibility=draft', 'visibility'],
  ])('answers 400 naming the parameter for %s', async (query, field) => {
    const res = await visitor.get(`/api/search?${query}`);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain(field);
  });

  it('filters by size (several, OR), family, type, language, overlapping years and a′ range', async () => {
    expect(ids(await search(visitor, 'size=alto&size=bass'))).toEqual([e.flute, e.treble, e.bass].sort());
    expect(ids(await search(visitor, 'size=alto,voice-flute'))).toEqual([e.flute, e.treble, e.voice].sort());
    expect(ids(await search(visitor, 'family=flute'))).toEqual([e.flute]);
    expect(ids(await search(visitor, 'type=inventory'))).toEqual([e.bass]);
    expect(ids(await search(visitor, 'lang=fr'))).toEqual([e.flute]);
    expect(ids(await search(visitor, 'from=1700&to=1745'))).toEqual([e.flute, e.bass].sort());
    expect(ids(await search(visitor, 'aMin=400&aMax=420'))).toEqual([e.treble, e.voice].sort());
    expect(ids(await search(visitor, 'aMax=395'))).toEqual([e.flute]);
  });

  it('counts facets as a direct SQL count does', async () => {
    const res = await search(visitor, '');
    const rows = await getSequelize().query<{ size_slug: string; n: number }>(
      `SELECT m.size_slug, COUNT(DISTINCT e.id) AS n FROM excerpts e JOIN instrument_mentions m ON m.excerpt_id = e.id
        JOIN sources s ON s.id = e.source_id WHERE e.status = 'approved' AND s.status = 'approved' GROUP BY m.size_slug`,
      { type: QueryTypes.SELECT },
    );
    expect(res.facets.sizes).toEqual(Object.fromEntries(rows.map((r) => [r.size_slug, Number(r.n)])));
    expect(res.facets.sourceType).toEqual({ treatise: 1, tutor: 2, inventory: 1 });
    expect(res.facets.decades).toMatchObject({ 1690: 2, 1700: 1, 1740: 1, 1750: 1 });
  });

  it('counts a ticked facet group without its own selection', async () => {
    const res = await search(visitor, 'size=alto');
    expect(res.total).toBe(2);
    expect(res.facets.sizes).toMatchObject({ alto: 2, bass: 1, 'voice-flute': 1 });
    expect(res.facets.sourceType).toEqual({ treatise: 1, tutor: 1 });
  });

  it('answers the same query the same way twice, and pages stably', async () => {
    const strip = ({ processingTimeMs: _t, ...rest }: SearchResponse) => rest;
    expect(strip(await search(visitor, 'q=flute&perPage=2'))).toEqual(strip(await search(visitor, 'q=flute&perPage=2')));
    const p1 = await search(visitor, 'perPage=2&page=1');
    const p2 = await search(visitor, 'perPage=2&page=2');
    expect(new Set([...ids(p1), ...ids(p2)]).size).toBe(4);
  });

  it('folds accents, follows concordance synonyms and forgives a small typo', async () => {
    expect(ids(await search(visitor, 'q=traversiere'))).toEqual([e.flute]);
    expect(ids(await search(visitor, 'q=Bassblockfloten'))).toEqual([e.bass]);
    // "Schnabelflöte" is written only in a mention of the French treatise (tagged alto): the synonym reaches the English alto passage too.
    expect(ids(await search(visitor, 'q=Schnabelflote'))).toEqual([e.flute, e.treble].sort());
    // Other names of a size (shared/reckoner/sizes.ts): "Altblockflöte" is the alto.
    expect(ids(await search(visitor, 'q=Altblockflöte'))).toEqual([e.flute, e.treble].sort());
    expect(ids(await search(visitor, 'q=swetly'))).toEqual([e.treble]);
  });

  it('answers 503 with a clear message while the search service is down', async () => {
    const realHost = process.env.MEILI_HOST;
    process.env.MEILI_HOST = `http://127.0.0.1:${await freePort()}`;
    resetConfigCache();
    resetSearchClient();
    try {
      const res = await visitor.get('/api/search?q=flute');
      expect(res.status).toBe(503);
      expect(res.body.error).toMatchObject({ code: 'unavailable', message: expect.stringMatching(/search is unavailable/i) });
    } finally {
      process.env.MEILI_HOST = realHost;
      resetConfigCache();
      resetSearchClient();
    }
  });
});
