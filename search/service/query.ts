/**
 * Query parsing (phrases, negation, 10-word limit, prefix last word) and
 * expansion of each query word against the vocabulary: exact term, prefix
 * completions, typo variants and synonyms — computed once per word and
 * cached per index version, so scoring only walks postings.
 */
import { words, allowedTypos, typoDistance } from './normalize';
import type { SearchIndex } from './index-store';

export interface QueryUnit {
  kind: 'word' | 'phrase';
  words: string[];
  prefix: boolean;
  negative: boolean;
}

/** Max query words considered, as Meilisearch does. */
const MAX_WORDS = 10;
/** Prefix completions kept for very short prefixes (most frequent first). */
const MAX_PREFIX_TERMS = 400;

export function parseQuery(q: string): QueryUnit[] {
  const units: QueryUnit[] = [];
  const re = /(-?)"([^"]*)"?|(-?)([^\s"]+)/g;
  let count = 0;
  let lastEnd = -1;
  let complete = true;
  let m: RegExpExecArray | null;
  while ((m = re.exec(q)) && count < MAX_WORDS) {
    if (m[2] !== undefined) {
      const ws = words(m[2]).slice(0, MAX_WORDS - count);
      if (!ws.length) continue;
      count += ws.length;
      units.push({ kind: 'phrase', words: ws, prefix: false, negative: m[1] === '-' });
      lastEnd = m.index + m[0].length;
      complete = true;
    } else {
      const neg = m[3] === '-' && m[4].length > 0;
      const ws = words(m[4]);
      let pushed = 0;
      for (const w of ws) {
        if (count >= MAX_WORDS) break;
        count++;
        pushed++;
        units.push({ kind: 'word', words: [w], prefix: false, negative: neg });
      }
      if (pushed) { lastEnd = m.index + m[0].length; complete = pushed === ws.length; }
    }
  }
  // The last word is a prefix unless the user already typed a separator after it.
  const last = units[units.length - 1];
  if (last && last.kind === 'word' && !last.negative && complete && lastEnd === q.length && /[\p{L}\p{N}\p{M}]$/u.test(q)) last.prefix = true;
  return units;
}

export interface Expansion { tid: number; typos: number; prefix: boolean }
export interface WordMatch {
  exps: Expansion[];
  /** multi-word synonyms, matched as phrases */
  phrases: string[][];
  /** terms to highlight fully; prefix words highlight the typed part */
  highlight: string[];
}

const caches = new WeakMap<SearchIndex, { version: number; map: Map<string, WordMatch> }>();

export function expandWord(ix: SearchIndex, w: string, prefix: boolean): WordMatch {
  let c = caches.get(ix);
  if (!c || c.version !== ix.version) { c = { version: ix.version, map: new Map() }; caches.set(ix, c); }
  const key = (prefix ? 'p:' : 'w:') + w;
  let r = c.map.get(key);
  if (!r) {
    r = computeExpansions(ix, w, prefix);
    if (c.map.size > 5000) c.map.clear();
    c.map.set(key, r);
  }
  return r;
}

function computeExpansions(ix: SearchIndex, w: string, prefix: boolean): WordMatch {
  const exps: Expansion[] = [];
  const seen = new Set<number>();
  const highlight: string[] = [w];
  const add = (tid: number, typos: number, pfx: boolean) => { if (!seen.has(tid)) { seen.add(tid); exps.push({ tid, typos, prefix: pfx }); } };
  const exact = ix.vocab.get(w);
  if (exact !== undefined) add(exact, 0, false);
  if (prefix) for (const tid of prefixTerms(ix, w)) add(tid, 0, true);
  const tt = ix.settings.typoTolerance;
  const numeric = /^\d+$/.test(w);
  const k = tt.enabled && !ix.noTypoWords.has(w) && !(numeric && tt.disableOnNumbers) ? allowedTypos(w.length, tt.minWordSizeForTypos.oneTypo, tt.minWordSizeForTypos.twoTypos) : 0;
  if (k > 0) {
    const first = w.charCodeAt(0);
    // A first-letter typo costs two, so one-typo words only need their own first-letter bucket.
    const buckets = k === 1 ? [ix.byFirst.get(first) ?? []] : [...ix.byFirst.values()];
    for (const b of buckets) {
      for (const tid of b) {
        if (seen.has(tid)) continue;
        const t = ix.terms[tid];
        if (prefix ? t.length < w.length - k : Math.abs(t.length - w.length) > k) continue;
        const d = typoDistance(w, t, k, prefix);
        if (d === 0 && prefix) add(tid, 0, true);
        else if (d > 0 && d <= k) { add(tid, d, prefix && t.length !== w.length); highlight.push(t); }
      }
    }
  }
  const phrases: string[][] = [];
  for (const alt of ix.synonyms.get(w) ?? []) {
    if (alt.length === 1) { const tid = ix.vocab.get(alt[0]); if (tid !== undefined) add(tid, 0, false); highlight.push(alt[0]); }
    else { phrases.push(alt); highlight.push(...alt); }
  }
  return { exps, phrases, highlight };
}

/** Terms starting with `w` (other than `w`), at most MAX_PREFIX_TERMS of the most frequent. */
function prefixTerms(ix: SearchIndex, w: string): number[] {
  const ids = ix.sortedTerms();
  const terms = ix.terms;
  let lo = 0, hi = ids.length;
  while (lo < hi) { const mid = (lo + hi) >>> 1; if (terms[ids[mid]] < w) lo = mid + 1; else hi = mid; }
  const out: number[] = [];
  for (let i = lo; i < ids.length && terms[ids[i]].startsWith(w); i++) if (terms[ids[i]] !== w) out.push(ids[i]);
  if (out.length > MAX_PREFIX_TERMS) {
    out.sort((a, b) => ix.postings[b].n - ix.postings[a].n);
    out.length = MAX_PREFIX_TERMS;
  }
  return out;
}
