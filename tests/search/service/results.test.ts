/**
 * Contract: what a search returns — facets and stats, highlighting,
 * cropping and _formatted, match positions, both pagination modes,
 * sorting, maxTotalHits, multi-search and GET search.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import type { Index } from 'meilisearch';
import { startHarness, stopHarness, seedSources, apiError, raw, ok, ids, type Harness, type Source } from './helpers';

let h: Harness;
let books: Index<Source>;
beforeAll(async () => {
  h = await startHarness();
  books = await seedSources(h.client, 'sources');
});
afterAll(async () => { await stopHarness(h); });

describe('facets', () => {
  it('facetDistribution counts values over all matches, alphabetically; facetStats gives numeric min/max', async () => {
    // Meilisearch docs — Search API reference: "facets" → facetDistribution and facetStats
    const r = await books.search('flute', { facets: ['genre', 'instruments', 'year'] });
    expect(r.facetDistribution?.genre).toEqual({ inventory: 1, treatise: 2 });
    expect(Object.keys(r.facetDistribution!.instruments)).toEqual(['bassoon', 'flute', 'oboe', 'recorder', 'shawm']);
    expect(r.facetDistribution?.instruments.flute).toBe(3);
    expect(r.facetStats).toEqual({ year: { min: 1681, max: 1752 } });
  });

  it('maxValuesPerFacet caps the values returned per facet', async () => {
    // Meilisearch docs — Settings: faceting.maxValuesPerFacet
    const idx = h.client.index('facet_cap');
    await ok(idx.addDocuments(['a', 'b', 'c', 'd'].map((g, i) => ({ id: i, g }))));
    await ok(idx.updateSettings({ filterableAttributes: ['g'], faceting: { maxValuesPerFacet: 2 } }));
    expect((await idx.search(null, { facets: ['g'] })).facetDistribution).toEqual({ g: { a: 1, b: 1 } });
  });

  it('facets on a non-filterable attribute are 400 invalid_search_facets', async () => {
    // Meilisearch docs — Errors: invalid_search_facets
    expect(await apiError(books.search(null, { facets: ['title'] }))).toMatchObject({ code: 'invalid_search_facets', status: 400 });
  });
});

describe('highlight, crop and _formatted', () => {
  it('_formatted is absent unless highlighting or cropping is asked', async () => {
    // Meilisearch docs — Search API reference: "_formatted ... only returned when attributesToHighlight or attributesToCrop"
    const r = await books.search('hautboy');
    expect(r.hits[0]).not.toHaveProperty('_formatted');
  });

  it('highlights matches with <em> by default, and with custom tags; _formatted holds every retrieved attribute', async () => {
    // Meilisearch docs — Search API reference: "Highlight tags" (highlightPreTag / highlightPostTag), attributesToHighlight
    const r = await books.search('hautboy', { attributesToHighlight: ['title'] });
    const fmt = r.hits[0]._formatted!;
    expect(fmt.title).toBe('Method for the <em>hautboy</em>');
    expect(fmt.body).toBe('Short instructions for the hautboy and its reeds, printed in London.');
    expect(Object.keys(fmt).sort()).toEqual(Object.keys(r.hits[0]).filter((k) => k !== '_formatted').sort());
    const c = await books.search('hautboy', { attributesToHighlight: ['*'], highlightPreTag: '<mark>', highlightPostTag: '</mark>' });
    expect(c.hits[0]._formatted?.body).toBe('Short instructions for the <mark>hautboy</mark> and its reeds, printed in London.');
  });

  it('highlights accented text matched by an unaccented query, and prefixes', async () => {
    // Meilisearch docs — Search API reference: attributesToHighlight ("*" highlights all displayed attributes)
    const r = await books.search('flute trav', { attributesToHighlight: ['*'], attributesToSearchOn: ['title'], matchingStrategy: 'all' });
    expect(r.hits[0]._formatted?.title).toBe('Principes de la <em>flûte</em> <em>trav</em>ersière');
  });

  it('crops to cropLength words around the match with the crop marker', async () => {
    // Meilisearch docs — Search API reference: attributesToCrop, cropLength, cropMarker
    const r = await books.search('accompanist', { attributesToCrop: ['body'], cropLength: 4 });
    expect(r.hits[0]._formatted?.body).toMatch(/^…duties of an accompanist\.?$/);
    const m = await books.search('accompanist', { attributesToCrop: ['body:3'], cropMarker: '[…]', attributesToHighlight: ['body'] });
    expect(m.hits[0]._formatted?.body).toBe('[…]of an <em>accompanist</em>');
    const centred = await books.search('transverse', { attributesToCrop: ['body:5'] });
    expect(centred.hits[0]._formatted?.body).toBe('…for the transverse flute, with…');
    // no match in the attribute: crop from its start
    const start = await books.search('hotteterre', { attributesToCrop: ['body:5'] });
    expect(start.hits[0]._formatted?.body).toBe('The first method for the…');
  });

  it('showMatchesPosition reports byte offsets of matches', async () => {
    // Meilisearch docs — Search API reference: showMatchesPosition ("start ... length in bytes")
    const r = await books.search('flute', { showMatchesPosition: true, attributesToSearchOn: ['title'] });
    const hit = r.hits.find((x) => x.id === 1)!;
    expect(hit._matchesPosition?.title).toEqual([{ start: 16, length: 6 }]);
  });
});

describe('pagination', () => {
  it('offset/limit mode returns estimatedTotalHits', async () => {
    // Meilisearch docs — Pagination: "offset and limit ... estimatedTotalHits"
    const r = await books.search(null, { offset: 2, limit: 3 });
    expect(r).toMatchObject({ offset: 2, limit: 3, estimatedTotalHits: 8 });
    expect(r.hits).toHaveLength(3);
    expect(r).not.toHaveProperty('totalPages');
    expect(ids(r)).toEqual(ids(await books.search(null)).slice(2, 5));
  });

  it('page/hitsPerPage mode returns totalHits and totalPages', async () => {
    // Meilisearch docs — Pagination: "Numbered page selectors: page, hitsPerPage, totalHits, totalPages"
    const r = await books.search(null, { page: 2, hitsPerPage: 3 });
    expect(r).toMatchObject({ page: 2, hitsPerPage: 3, totalHits: 8, totalPages: 3 });
    expect(r.hits).toHaveLength(3);
    expect(r).not.toHaveProperty('estimatedTotalHits');
    expect((await books.search(null, { page: 3, hitsPerPage: 3 })).hits).toHaveLength(2);
    expect((await books.search(null, { hitsPerPage: 5 })).page).toBe(1);
  });

  it('totals and reachable hits are capped at pagination.maxTotalHits', async () => {
    // Meilisearch docs — Settings: pagination.maxTotalHits ("maximum number of search results Meilisearch can return")
    const idx = h.client.index('capped');
    await ok(idx.addDocuments(Array.from({ length: 30 }, (_, i) => ({ id: i, t: 'reed' }))));
    await ok(idx.updateSettings({ pagination: { maxTotalHits: 10 } }));
    expect(await idx.search('reed', { limit: 20 })).toMatchObject({ estimatedTotalHits: 10 });
    expect((await idx.search('reed', { limit: 20 })).hits).toHaveLength(10);
    expect((await idx.search('reed', { offset: 8, limit: 5 })).hits).toHaveLength(2);
    expect(await idx.search('reed', { page: 1, hitsPerPage: 4 })).toMatchObject({ totalHits: 10, totalPages: 3 });
    expect((await idx.search('reed', { page: 3, hitsPerPage: 4 })).hits).toHaveLength(2);
  });
});

describe('sort', () => {
  it('sorts placeholder results by a sortable attribute; documents without it come last', async () => {
    // Meilisearch docs — Sorting: "sort ... attribute:asc / attribute:desc"; documents lacking the field are ranked last
    expect(ids(await books.search(null, { sort: ['year:asc'] }))).toEqual([6, 3, 1, 2, 4, 7, 8, 5]);
    expect(ids(await books.search(null, { sort: ['year:desc'] }))).toEqual([8, 7, 4, 2, 1, 3, 6, 5]);
  });

  it('sort orders results within relevance buckets of a query', async () => {
    // Meilisearch docs — Ranking rules: "sort" ranking rule position after words/typo/proximity/attribute
    expect(ids(await books.search('traversiere', { sort: ['year:desc'] }))).toEqual([2, 1]);
    expect(ids(await books.search('traversiere', { sort: ['year:asc'] }))).toEqual([1, 2]);
    // an exact match (flûte) still outranks a typo match (Flöte) whatever the sort
    expect(ids(await books.search('flute', { filter: 'genre = treatise', sort: ['year:desc'], attributesToSearchOn: ['title'] }))).toEqual([1, 2]);
  });

  it('a non-sortable attribute is 400 invalid_search_sort', async () => {
    // Meilisearch docs — Errors: invalid_search_sort
    const e = await apiError(books.search(null, { sort: ['author:asc'] }));
    expect(e).toMatchObject({ code: 'invalid_search_sort', status: 400 });
    expect(e.message).toContain('author');
  });
});

describe('multi-search and GET', () => {
  it('runs queries in order and returns one result per query with its indexUid', async () => {
    // Meilisearch docs — Multi-search: "results ... in the same order as the queries", each with indexUid
    const r = await h.client.multiSearch({ queries: [{ indexUid: 'sources', q: 'oboe', limit: 1 }, { indexUid: 'capped', q: 'reed', limit: 2 }] });
    expect(r.results).toHaveLength(2);
    expect(r.results[0]).toMatchObject({ indexUid: 'sources', limit: 1, query: 'oboe' });
    expect(r.results[1]).toMatchObject({ indexUid: 'capped', limit: 2 });
  });

  it('the first failing query fails the whole request', async () => {
    // Meilisearch docs — Multi-search: "if one query fails, the request fails"; Errors: index_not_found
    const r = await raw(h, 'POST', '/multi-search', { queries: [{ indexUid: 'sources', q: 'x' }, { indexUid: 'missing', q: 'x' }] });
    expect(r.status).toBe(404);
    expect(r.body.code).toBe('index_not_found');
  });

  it('GET search takes the same parameters as query strings', async () => {
    // Meilisearch docs — Search API reference: "Search in an index with GET"
    const get = await books.searchGet('flute', { limit: 2, attributesToRetrieve: ['id', 'title'], facets: ['genre'], attributesToHighlight: ['title'] });
    const post = await books.search('flute', { limit: 2, attributesToRetrieve: ['id', 'title'], facets: ['genre'], attributesToHighlight: ['title'] });
    expect(get.hits).toEqual(post.hits);
    expect(get.facetDistribution).toEqual(post.facetDistribution);
    expect(Object.keys(get.hits[0]).sort()).toEqual(['_formatted', 'id', 'title']);
  });
});
