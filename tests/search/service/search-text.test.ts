/**
 * Contract: full-text behaviour — placeholder search, typo tolerance
 * thresholds, case/diacritic folding, phrases, negation, prefix, synonyms,
 * stop words, matching strategies and the first ranking rules.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import type { Index } from 'meilisearch';
import { startHarness, stopHarness, seedSources, ok, ids, SOURCES, type Harness, type Source } from './helpers';

let h: Harness;
let books: Index<Source>;
beforeAll(async () => {
  h = await startHarness();
  books = await seedSources(h.client, 'sources');
});
afterAll(async () => { await stopHarness(h); });

describe('placeholder search', () => {
  it('q null or empty returns every document', async () => {
    // Meilisearch docs — Search API reference: "q ... placeholder search: when q is empty or missing, returns all searchable documents"
    const a = await books.search(null);
    const b = await books.search('');
    expect(a.estimatedTotalHits).toBe(SOURCES.length);
    expect(ids(a).sort()).toEqual(SOURCES.map((s) => s.id).sort());
    expect(ids(b)).toEqual(ids(a));
    // Meilisearch docs — Search API reference: response object has hits, query, processingTimeMs, limit, offset, estimatedTotalHits
    expect(a).toMatchObject({ query: '', limit: 20, offset: 0 });
    expect(typeof a.processingTimeMs).toBe('number');
  });
});

describe('typo tolerance', () => {
  let typos: Index;
  beforeAll(async () => {
    typos = h.client.index('typos');
    await ok(typos.addDocuments([
      { id: 1, w: 'reed' }, { id: 2, w: 'flute' }, { id: 3, w: 'bassoon' }, { id: 4, w: 'traversiere' },
    ]));
  });

  it('words under 5 characters must match exactly', async () => {
    // Meilisearch docs — Typo tolerance settings: minWordSizeForTypos.oneTypo default 5
    expect(ids(await typos.search('reef '))).toEqual([]);
    expect(ids(await typos.search('reed '))).toEqual([1]);
  });

  it('words of 5 to 8 characters accept one typo, not two', async () => {
    // Meilisearch docs — Typo tolerance settings: "oneTypo ... minimum word size to accept 1 typo"
    expect(ids(await typos.search('flote '))).toEqual([2]);
    expect(ids(await typos.search('basson '))).toEqual([3]);
    expect(ids(await typos.search('flxtx '))).toEqual([]);
    expect(ids(await typos.search('bxssxon '))).toEqual([]);
  });

  it('words of 9 or more characters accept two typos, not three', async () => {
    // Meilisearch docs — Typo tolerance settings: minWordSizeForTypos.twoTypos default 9
    expect(ids(await typos.search('travirsiare '))).toEqual([4]);
    expect(ids(await typos.search('trovirsiaro '))).toEqual([]);
  });

  it('exact matches rank above typo matches', async () => {
    // Meilisearch docs — Ranking rules: "typo: results are sorted by increasing number of typos"
    await ok(typos.addDocuments([{ id: 5, w: 'flote' }]));
    expect(ids(await typos.search('flute '))).toEqual([2, 5]);
    expect(ids(await typos.search('flote '))).toEqual([5, 2]);
  });

  it('disableOnWords and enabled:false switch typos off', async () => {
    // Meilisearch docs — Typo tolerance settings: disableOnWords, enabled
    // the listed query words are matched exactly
    await ok(typos.updateSettings({ typoTolerance: { disableOnWords: ['Flote'] } }));
    expect(ids(await typos.search('flote '))).toEqual([5]);
    expect(ids(await typos.search('basson '))).toEqual([3]);
    await ok(typos.updateSettings({ typoTolerance: { enabled: false } }));
    expect(ids(await typos.search('travirsiere '))).toEqual([]);
    await ok(typos.updateSettings({ typoTolerance: null }));
    expect(ids(await typos.search('flote '))).toEqual([5, 2]);
  });
});

describe('normalisation', () => {
  it('matching ignores case and diacritics: flute finds Flûte and Flöte', async () => {
    // Meilisearch docs — Language / tokenization: normalisation lower-cases and removes diacritics for Latin scripts
    const r = await books.search('flute traversiere', { matchingStrategy: 'all' });
    expect(ids(r).sort()).toEqual([1, 2]);
    // a phrase matches exactly (no typos), so Flûte and Flöte stay distinct while case and accents fold
    expect(ids(await books.search('"FLUTE TRAVERSIERE"'))).toEqual([1]);
    expect(ids(await books.search('"flote traversière"'))).toEqual([2]);
    expect(ids(await books.search('LEFEVRE'))).toEqual([7]);
  });
});

describe('query syntax', () => {
  it('"quoted phrases" need the words next to each other', async () => {
    // Meilisearch docs — Search API reference: "Phrase search: enclosing a phrase in double quotes"
    expect(ids(await books.search('"transverse flute"'))).toEqual([1]);
    expect(ids(await books.search('"flute transverse"'))).toEqual([]);
  });

  it('a leading - excludes documents containing the word or phrase', async () => {
    // Meilisearch docs — Search API reference: "Negative search: -word excludes documents containing word"
    const all = ids(await books.search('flute'));
    expect(all).toContain(2);
    const r = ids(await books.search('flute -quantz'));
    expect(r).not.toContain(2);
    expect(r.length).toBe(all.length - 1);
    expect(ids(await books.search('flute -"transverse flute"'))).not.toContain(1);
  });

  it('the last word matches as a prefix, earlier words do not', async () => {
    // Meilisearch docs — Search API reference: "Query term ... prefix search on the last word"; Concepts: prefix search
    expect(ids(await books.search('hautb'))).toEqual([3]);
    expect(ids(await books.search('hautb reeds', { matchingStrategy: 'all' }))).toEqual([]);
    expect(ids(await books.search('reeds hautb', { matchingStrategy: 'all' }))).toEqual([3]);
  });

  it('only the first ten words of the query are used', async () => {
    // Meilisearch docs — Known limitations: "Maximum number of query words: 10 ... additional terms are ignored"
    const q = 'scraping and shaping reeds for the bassoon the tip must zzzzqqqq';
    expect(ids(await books.search(q, { matchingStrategy: 'all' }))).toEqual([4]);
  });
});

describe('synonyms and stop words', () => {
  it('synonyms expand the query, normalised like text, both ways when declared both ways', async () => {
    // Meilisearch docs — Synonyms: "mutual association" is declared in both directions
    await ok(books.updateSettings({ synonyms: { hautbois: ['oboe'], oboe: ['hautbois'], 'Flûte': ['traverso'], traverso: ['flûte'] } }));
    expect(ids(await books.search('hautbois ')).sort()).toEqual([1, 3, 8].sort());
    expect(ids(await books.search('traverso ')).sort()).toEqual(ids(await books.search('flute ')).sort());
    await ok(books.updateSettings({ synonyms: null }));
    expect(ids(await books.search('hautbois '))).toEqual([]);
  });

  it('stop words are ignored in queries', async () => {
    // Meilisearch docs — Stop words: "ignored ... in search queries"
    expect(ids(await books.search('of hautboy', { matchingStrategy: 'all' }))).toEqual([]);
    await ok(books.updateSettings({ stopWords: ['of', 'the'] }));
    expect(ids(await books.search('of hautboy', { matchingStrategy: 'all' }))).toEqual([3]);
    await ok(books.updateSettings({ stopWords: null }));
  });
});

describe('matching strategy and ranking', () => {
  it('last: all words first, then drops words from the end; all: every word', async () => {
    // Meilisearch docs — Search API reference: matchingStrategy "last" / "all"
    const last = ids(await books.search('flute bassoon '));
    expect(last[0]).toBe(6); // both words
    expect(last.slice(1).sort()).toEqual([1, 2]); // flute only
    expect(last).not.toContain(4); // bassoon only: the first word is never dropped
    expect(ids(await books.search('flute bassoon ', { matchingStrategy: 'all' }))).toEqual([6]);
  });

  it('frequency: drops the most frequent words first', async () => {
    // Meilisearch docs — Search API reference: matchingStrategy "frequency" ("returns documents containing the least frequent terms")
    const r = ids(await books.search('flute clarinet ', { matchingStrategy: 'frequency' }));
    expect(r).toContain(7);
    expect(r).not.toContain(1);
  });

  it('more matched words rank first; then the earlier searchable attribute ranks higher', async () => {
    // Meilisearch docs — Ranking rules: "words", then "attribute" (order of searchableAttributes = importance)
    const idx = h.client.index('attr_rank');
    await ok(idx.addDocuments([{ id: 1, title: 'Letters', body: 'about the bassoon' }, { id: 2, title: 'Bassoon', body: 'letters' }]));
    await ok(idx.updateSettings({ searchableAttributes: ['title', 'body'] }));
    expect(ids(await idx.search('bassoon '))).toEqual([2, 1]);
    await ok(idx.updateSettings({ searchableAttributes: ['body', 'title'] }));
    expect(ids(await idx.search('bassoon '))).toEqual([1, 2]);
  });

  it('attributesToSearchOn restricts the attributes searched', async () => {
    // Meilisearch docs — Search API reference: attributesToSearchOn
    expect(ids(await books.search('anonymous', { attributesToSearchOn: ['body'] }))).toEqual([]);
    expect(ids(await books.search('anonymous', { attributesToSearchOn: ['author'] })).sort()).toEqual([3, 5]);
  });
});

describe('multi-word synonyms', () => {
  it('a multi-word synonym key matches its alternatives, and multi-word alternatives match as phrases', async () => {
    // Meilisearch docs — Synonyms: "multi-word synonyms" (e.g. "san francisco" ↔ "sf")
    const idx = h.client.index('multi_syn');
    await ok(idx.addDocuments([{ id: 1, t: 'a recorder in C' }, { id: 2, t: 'a flute with a beak' }, { id: 3, t: 'the tenor recorder' }]));
    await ok(idx.updateSettings({ synonyms: { 'flûte à bec': ['recorder'], taille: ['tenor recorder'] } }));
    expect(ids(await idx.search('flute a bec ', { matchingStrategy: 'all' })).sort()).toEqual([1, 3]);
    expect(ids(await idx.search('taille '))).toEqual([3]);
  });

  it('a multi-word synonym key matches when it contains a stop word, in any case and with or without accents', async () => {
    // Meilisearch docs — Synonyms: multi-word synonyms (the whole key is one unit of the query)
    const idx = h.client.index('multi_syn_stop');
    await ok(idx.addDocuments([{ id: 1, t: 'an alto recorder' }, { id: 2, t: 'la flûte douce' }, { id: 3, t: 'a recorder' }, { id: 4, t: 'a bec' }]));
    await ok(idx.updateSettings({ stopWords: ['a', 'la'], synonyms: { 'flûte à bec': ['recorder'], 'flûte douce': ['alto recorder'] } }));
    expect(ids(await idx.search('Flûte à bec', { matchingStrategy: 'all' })).sort()).toEqual([1, 3]);
    expect(ids(await idx.search('flute a bec ', { matchingStrategy: 'all' })).sort()).toEqual([1, 3]);
    expect(ids(await idx.search('flute douce', { matchingStrategy: 'all' })).sort()).toEqual([1, 2]);
  });
});
