/**
 * Contract: filter expressions (search-api.md §4) — every operator, array
 * fields, precedence, quoting, the array form, and the errors.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import type { Index } from 'meilisearch';
import { startHarness, stopHarness, seedSources, apiError, raw, type Harness, type Source } from './helpers';

let h: Harness;
let books: Index<Source>;
beforeAll(async () => {
  h = await startHarness();
  books = await seedSources(h.client, 'sources');
});
afterAll(async () => { await stopHarness(h); });

const f = async (filter: string | (string | string[])[]) => (await books.search(null, { filter })).hits.map((x) => x.id).sort((a, b) => a - b);

describe('comparisons', () => {
  it('= is case-insensitive and does not fold diacritics', async () => {
    // Meilisearch docs — Filtering: filter expression syntax, "Conditions ... = equality"; Meilisearch engine: facet values are lower-cased, not de-accented
    expect(await f('genre = treatise')).toEqual([1, 2]);
    expect(await f('genre = TREATISE')).toEqual([1, 2]);
    expect(await f('author = "Lefèvre"')).toEqual([7]);
    expect(await f('author = lefèvre')).toEqual([7]);
    expect(await f('author = Lefevre')).toEqual([]);
  });

  it('!= also matches documents lacking the attribute', async () => {
    // Meilisearch docs — Filtering: "Conditions ... != ... returns all documents not selected by =, including those without the attribute"
    expect(await f('genre != treatise')).toEqual([3, 4, 5, 6, 7, 8]);
    expect(await f('instruments != flute')).toEqual([3, 4, 5, 7, 8]);
  });

  it('>, >=, <, <= compare numbers numerically', async () => {
    // Meilisearch docs — Filtering: "Comparison operators >, >=, <, <= ... numeric values"
    expect(await f('year > 1752')).toEqual([4, 7, 8]);
    expect(await f('year >= 1752')).toEqual([2, 4, 7, 8]);
    expect(await f('year < 1695')).toEqual([6]);
    expect(await f('year <= 1695')).toEqual([3, 6]);
    expect(await f('year > 800')).toEqual([1, 2, 3, 4, 6, 7, 8]);
    expect(await f('year = 1707.0')).toEqual([1]);
  });

  it('TO is an inclusive range', async () => {
    // Meilisearch docs — Filtering: filter expression syntax, "Conditions with TO"
    expect(await f('year 1707 TO 1752')).toEqual([1, 2]);
    expect(await f('year 1708 TO 1751')).toEqual([]);
  });

  it('IN and NOT IN', async () => {
    // Meilisearch docs — Filtering: "IN ... NOT IN" operators
    expect(await f('genre IN [method, letter]')).toEqual([3, 4, 7]);
    expect(await f('genre IN [method, letter,]')).toEqual([3, 4, 7]);
    expect(await f('genre NOT IN [treatise, method]')).toEqual([4, 5, 6, 8]);
  });

  it('an array attribute matches when any element does', async () => {
    // Meilisearch docs — Filtering: "filtering on arrays ... if any value in the array matches"
    expect(await f('instruments = oboe')).toEqual([1, 3]);
    expect(await f('instruments IN [shawm, clarinet]')).toEqual([6, 7]);
  });
});

describe('presence operators', () => {
  it('EXISTS and NOT EXISTS', async () => {
    // Meilisearch docs — Filtering: "EXISTS ... the attribute exists, even if null or empty"
    expect(await f('instruments EXISTS')).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(await f('instruments NOT EXISTS')).toEqual([8]);
    expect(await f('year EXISTS')).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
  });

  it('IS NULL and IS NOT NULL', async () => {
    // Meilisearch docs — Filtering: "IS NULL ... value is null"
    expect(await f('year IS NULL')).toEqual([5]);
    expect(await f('year IS NOT NULL')).toEqual([1, 2, 3, 4, 6, 7, 8]);
  });

  it('IS EMPTY and IS NOT EMPTY', async () => {
    // Meilisearch docs — Filtering: "IS EMPTY ... empty string, array or object"
    expect(await f('instruments IS EMPTY')).toEqual([5]);
    expect(await f('instruments IS NOT EMPTY')).toEqual([1, 2, 3, 4, 6, 7, 8]);
  });
});

describe('combination', () => {
  it('NOT binds tighter than AND, AND tighter than OR; parentheses group', async () => {
    // Meilisearch docs — Filtering: "Creating filter expressions ... NOT > AND > OR"
    expect(await f('genre = method OR genre = letter AND year > 1790')).toEqual([3, 7]);
    expect(await f('(genre = method OR genre = letter) AND year > 1790')).toEqual([7]);
    expect(await f('NOT genre = treatise AND year < 1700')).toEqual([3, 6]);
    expect(await f('NOT (genre = treatise OR genre = method)')).toEqual([4, 5, 6, 8]);
  });

  it('quoted values may hold spaces, keywords and escaped quotes', async () => {
    // Meilisearch docs — Filtering: "filter values containing whitespace ... must be enclosed in quotes"; escaping quotes with a backslash
    expect(await f('author = "Court of Oderstadt"')).toEqual([6]);
    expect(await f(`author = "O'Neill"`)).toEqual([8]);
    expect(await f(`author = 'O\\'Neill'`)).toEqual([8]);
    expect(await f('genre = "OR"')).toEqual([]);
  });

  it('the array form is an AND of ORs', async () => {
    // Meilisearch docs — Filtering: "Array syntax: outer array elements are connected by AND, inner by OR"
    expect(await f([['genre = method', 'genre = letter'], 'year > 1700'])).toEqual([4, 7]);
    expect(await f(['genre = treatise', 'year < 1750'])).toEqual([1]);
  });

  it('filters combine with the query and with GET search', async () => {
    // Meilisearch docs — Search API reference: "filter" (POST and GET)
    expect((await books.search('flute', { filter: 'year < 1700' })).hits.map((x) => x.id)).toEqual([6]);
    expect((await books.searchGet('flute', { filter: 'year < 1700' })).hits.map((x) => x.id)).toEqual([6]);
  });
});

describe('errors', () => {
  it('a filter on a non-filterable attribute is 400 invalid_search_filter naming it', async () => {
    // Meilisearch docs — Errors: invalid_search_filter ("Attribute `title` is not filterable. Available filterable attributes are ...")
    const e = await apiError(books.search(null, { filter: 'title = flute' }));
    expect(e).toMatchObject({ code: 'invalid_search_filter', type: 'invalid_request', status: 400 });
    expect(e.message).toContain('Attribute `title` is not filterable');
    expect(e.message).toContain('`genre`');
    expect(e.message).toContain('1:6 title = flute');
  });

  it('syntax errors are invalid_search_filter', async () => {
    // Meilisearch docs — Errors: invalid_search_filter ("syntax error in filter")
    for (const bad of ['genre =', 'genre = treatise AND', '(genre = method', 'genre treatise', 'year 1700 TO', 'genre IN method', 'genre = "open']) {
      const r = await raw(h, 'POST', '/indexes/sources/search', { filter: bad });
      expect(r.status, bad).toBe(400);
      expect(r.body.code, bad).toBe('invalid_search_filter');
    }
  });

  it('filters nested deeper than two array levels are refused', async () => {
    // Meilisearch docs — Filtering: array syntax allows at most two levels
    const r = await raw(h, 'POST', '/indexes/sources/search', { filter: [[['genre = method']]] });
    expect(r.status).toBe(400);
    expect(r.body.code).toBe('invalid_search_filter');
  });
});
