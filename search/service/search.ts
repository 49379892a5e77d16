/**
 * One search request against one index: filter → candidate bitset,
 * negations, per-unit matching (ranking.ts), matching strategy, facets over
 * the matched set, top-k selection with a bounded heap, then formatting of
 * only the returned page.
 */
import { ApiError } from './errors';
import { parseFilter } from './filter-parser';
import { checkFilterable, evalFilter } from './filter-eval';
import { attrMatches } from './settings';
import type { SearchIndex } from './index-store';
import type { SearchParams } from './params';
import { parseQuery, expandWord, type QueryUnit } from './query';
import { scratch, matchWord, matchPhrase, phraseSlots } from './ranking';
import { facetDistribution, validateFacets } from './facets';
import { formatHit, makeMatcher } from './format';
import type { SortField } from './facet-index';

interface SortSpec { f: SortField; desc: boolean }

function parseSort(ix: SearchIndex, sort: string[] | null): SortSpec[] {
  if (!sort) return [];
  return sort.map((s) => {
    const m = /^(.+):(asc|desc)$/.exec(s.trim());
    if (!m) throw new ApiError('invalid_search_sort', `Invalid syntax for the sort parameter: expected expression ending by \`:asc\` or \`:desc\`, found \`${s}\`.`);
    const f = ix.sortField(m[1]);
    if (!f) {
      const avail = ix.settings.sortableAttributes;
      throw new ApiError('invalid_search_sort', `Index \`${ix.uid}\`: Attribute \`${m[1]}\` is not sortable. ${avail.length ? `Available sortable attributes are: ${avail.map((a) => `\`${a}\``).join(', ')}.` : 'This index does not have configured sortable attributes.'}`);
    }
    return { f, desc: m[2] === 'desc' };
  });
}

function searchMaskOf(ix: SearchIndex, on: string[] | null): number {
  if (!on) return 0xffff;
  const s = ix.settings.searchableAttributes;
  for (const a of on) {
    if (!s.includes('*') && !attrMatches(s, a)) throw new ApiError('invalid_search_attributes_to_search_on', `Index \`${ix.uid}\`: Attribute \`${a}\` is not searchable. Available searchable attributes are: ${s.map((x) => `\`${x}\``).join(', ')}.`);
  }
  return ix.maskOf(on);
}

/** Keeps the best k slots by `better`, worst at the root. */
function topK(slots: ArrayLike<number>, n: number, k: number, better: (a: number, b: number) => boolean): number[] {
  if (k <= 0) return [];
  const h: number[] = [];
  const worse = (a: number, b: number) => better(b, a);
  const up = (i: number) => { while (i > 0) { const p = (i - 1) >> 1; if (worse(h[i], h[p])) { [h[i], h[p]] = [h[p], h[i]]; i = p; } else break; } };
  const down = (i: number) => {
    for (;;) {
      const l = 2 * i + 1, r = l + 1;
      let w = i;
      if (l < h.length && worse(h[l], h[w])) w = l;
      if (r < h.length && worse(h[r], h[w])) w = r;
      if (w === i) return;
      [h[i], h[w]] = [h[w], h[i]]; i = w;
    }
  };
  for (let i = 0; i < n; i++) {
    const s = slots[i];
    if (h.length < k) { h.push(s); up(h.length - 1); } else if (better(s, h[0])) { h[0] = s; down(0); }
  }
  return h.sort((a, b) => (better(a, b) ? -1 : better(b, a) ? 1 : 0));
}

export function runSearch(ix: SearchIndex, p: SearchParams, indexUid = ix.uid): Record<string, unknown> {
  const t0 = performance.now();
  const filterAst = parseFilter(p.filter);
  if (filterAst) checkFilterable(ix, filterAst);
  const sorts = parseSort(ix, p.sort);
  const facetNames = p.facets ? validateFacets(ix, p.facets) : null;
  const searchMask = searchMaskOf(ix, p.attributesToSearchOn);
  const typoMask = 0xffff & ~ix.maskOf(ix.settings.typoTolerance.disableOnAttributes);

  const cand = filterAst ? evalFilter(ix, filterAst) : ix.alive.clone();
  const units = parseQuery(p.q ?? '');
  for (const u of units) {
    if (!u.negative) continue;
    if (u.kind === 'phrase') for (const { slot } of phraseSlots(ix, cand, u.words, 0xffff)) cand.remove(slot);
    else { const t = ix.vocab.get(u.words[0]); if (t !== undefined) { const pl = ix.postings[t]; for (let j = 0; j < pl.n; j++) cand.remove(pl.docs[j]); } }
  }
  // Stop words are ignored in the query, except a last word still being typed.
  const kept = units.filter((u) => !u.negative);
  const pos: QueryUnit[] = kept.filter((u) => !(u.kind === 'word' && !u.prefix && ix.stopSet.has(u.words[0])));

  let matched: Uint32Array;
  let better: (a: number, b: number) => boolean;
  const order = ix.order;
  const highlight: string[] = [];
  const prefixes: string[] = [];
  let n = pos.length;
  const S = scratch;
  if (n === 0) {
    matched = cand.toSlots();
    better = (a, b) => { for (const s of sorts) { const c = s.f.compare(a, b, s.desc); if (c) return c < 0; } return order[a] < order[b]; };
  } else {
    S.ensure(ix.slots);
    S.reset();
    const counts: number[] = [];
    pos.forEach((u, i) => {
      if (u.kind === 'phrase') { matchPhrase(ix, cand, u.words, searchMask); highlight.push(...u.words); }
      else {
        const wm = expandWord(ix, u.words[0], u.prefix);
        matchWord(ix, cand, wm.exps, searchMask, typoMask);
        for (const ph of wm.phrases) matchPhrase(ix, cand, ph, searchMask);
        highlight.push(...wm.highlight);
        if (u.prefix) prefixes.push(u.words[0]);
      }
      counts.push(S.commitUnit(1 << i));
    });
    // Multi-word synonym keys ("flute a bec" → recorder): an alternative's match counts for every word it stands for.
    // Spans run over the typed words including stop words ("à" in "flûte à bec"), which carry no unit bit of their own.
    const bitOf = kept.map((u) => { const j = pos.indexOf(u); return j >= 0 ? 1 << j : 0; });
    for (let len = 2; len <= 4; len++) {
      for (let i = 0; i + len <= kept.length; i++) {
        const span = kept.slice(i, i + len);
        if (span.some((u) => u.kind !== 'word')) continue;
        const alts = ix.synonyms.get(span.map((u) => u.words[0]).join(' '));
        if (!alts?.length) continue;
        let bits = 0;
        for (let j = i; j < i + len; j++) bits |= bitOf[j];
        if (!bits) continue;
        for (const alt of alts) {
          if (alt.length === 1) { const tid = ix.vocab.get(alt[0]); if (tid !== undefined) matchWord(ix, cand, [{ tid, typos: 0, prefix: false }], searchMask, typoMask); }
          else matchPhrase(ix, cand, alt, searchMask);
          highlight.push(...alt);
        }
        S.commitUnit(bits);
      }
    }
    // Required unit sets per "words" level, per matching strategy.
    const req: number[] = new Array(n + 1).fill(-1);
    if (p.matchingStrategy === 'all') req[n] = (1 << n) - 1;
    else if (p.matchingStrategy === 'last') for (let l = 1; l <= n; l++) req[l] = (1 << l) - 1;
    else {
      const byRarity = counts.map((c, i) => i).sort((a, b) => counts[a] - counts[b]);
      let m = 0;
      byRarity.forEach((u, j) => { m |= 1 << u; req[j + 1] = m; });
    }
    const out = new Uint32Array(S.dN);
    let k = 0;
    for (let i = 0; i < S.dN; i++) {
      const s = S.dTouched[i];
      const mask = S.dMask[s];
      let level = 0;
      for (let l = n; l >= 1; l--) if (req[l] >= 0 && (mask & req[l]) === req[l]) { level = l; break; }
      if (!level) continue;
      out[k++] = s;
      S.key[s] = level * 1e6 + (999 - Math.min(S.dTypo[s], 999)) * 1e3 + (999 - Math.min(S.dAttr[s], 999));
    }
    matched = out.subarray(0, k);
    const key = S.key, score = S.dScore;
    better = (a, b) => {
      if (key[a] !== key[b]) return key[a] > key[b];
      for (const s of sorts) { const c = s.f.compare(a, b, s.desc); if (c) return c < 0; }
      if (score[a] !== score[b]) return score[a] > score[b];
      return order[a] < order[b];
    };
  }

  const maxTotal = ix.settings.pagination.maxTotalHits;
  const total = matched.length;
  const capped = Math.min(total, maxTotal);
  const start = p.pageMode ? (p.page - 1) * p.hitsPerPage : p.offset;
  const end = Math.min(p.pageMode ? start + p.hitsPerPage : start + p.limit, maxTotal);
  const page = end > start ? topK(matched, matched.length, end, better).slice(start, end) : [];

  const matcher = makeMatcher(highlight, prefixes);
  const hits = page.map((s) => {
    const hit = formatHit(ix, ix.docs[s]!, p, matcher);
    if (p.showRankingScore) hit._rankingScore = n === 0 ? 1 : rankingScore(S.key[s], S.dTypo[s], n);
    return hit;
  });
  const body: Record<string, unknown> = { hits, query: p.q ?? '', processingTimeMs: 0 };
  if (p.pageMode) Object.assign(body, { hitsPerPage: p.hitsPerPage, page: p.page, totalPages: p.hitsPerPage ? Math.ceil(capped / p.hitsPerPage) : 0, totalHits: capped });
  else Object.assign(body, { limit: p.limit, offset: p.offset, estimatedTotalHits: capped });
  if (facetNames) Object.assign(body, facetDistribution(ix, facetNames, matched));
  body.processingTimeMs = Math.round(performance.now() - t0);
  if (indexUid !== ix.uid) body.indexUid = indexUid;
  return body;
}

/** A 0–1 score shaped like Meilisearch's: words share first, then typos. */
function rankingScore(key: number, typos: number, n: number): number {
  const level = Math.floor(key / 1e6);
  return Math.round(((level - 1 + 1 / (1 + typos)) / n) * 1e4) / 1e4;
}
