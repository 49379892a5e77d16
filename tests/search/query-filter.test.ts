import { describe, expect, it } from 'vitest';
import { searchQuerySchema, snippetRuns } from '@shared/search/schema';
import { buildFilter, quote, toSnippet, visibilityFilter } from '@search/query';

const query = (raw: Record<string, unknown>) => searchQuerySchema.parse(raw);

describe('search filter building', () => {
  it('quotes and escapes every string so it stays one value', () => {
    expect(quote('alto')).toBe('"alto"');
    expect(quote('a "b" \\ c')).toBe('"a \\"b\\" \\\\ c"');
  });

  it('puts the visibility clause first, as its own element of the array form', () => {
    expect(buildFilter(query({ size: 'alto,tenor', from: '1700' }), null)).toEqual([
      'visibility = "public"',
      'sizes IN ["alto", "tenor"]',
      'yearLatest >= 1700',
    ]);
    expect(buildFilter(query({}), { id: 7, role: 'contributor' })).toEqual(['(visibility = "public" OR ownerIds = 7)']);
    expect(buildFilter(query({}), { id: 7, role: 'editor' })).toEqual([]);
    expect(visibilityFilter({ id: 3, role: 'reader' })).toBe('visibility = "public"');
  });

  it('leaves a ticked group out of its own disjunctive count', () => {
    const q = query({ size: 'alto', type: 'treatise', aMin: '400', aMax: '420' });
    expect(buildFilter(q, null, 'sizes')).toEqual(['visibility = "public"', 'sourceType IN ["treatise"]', 'aHz 400 TO 420']);
  });

  it('refuses filter syntax smuggled into list parameters before any filter is built', () => {
    expect(searchQuerySchema.safeParse({ size: 'alto") OR (status = draft' }).success).toBe(false);
    expect(searchQuerySchema.safeParse({ lang: 'en" OR visibility = "draft' }).success).toBe(false);
    expect(searchQuerySchema.safeParse({ from: '1700 OR 1' }).success).toBe(false);
  });
});

describe('snippets', () => {
  it('escapes the passage and marks only what the service highlighted', () => {
    const html = toSnippet('a <b>bold</b> \uE000flûte\uE001 & "douce"');
    expect(html).toBe('a &lt;b&gt;bold&lt;/b&gt; <mark>flûte</mark> &amp; &quot;douce&quot;');
    expect(snippetRuns(html)).toEqual([
      { text: 'a <b>bold</b> ', marked: false },
      { text: 'flûte', marked: true },
      { text: ' & "douce"', marked: false },
    ]);
  });
});
