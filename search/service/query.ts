/**
 * Query parsing (phrases, negation, 10-word limit, prefix last word) and
 * expansion of each query word against the vocabulary: exact term, prefix
 * completions, typo variants and synonyms — computed once per word and
 * cached per index version, so scoring only walks postings.
 */
import { words, allowedTypos, typoDistance } from './normalize';
import { charMask, type SearchIndex } from './index-store';

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

/**
 * A cached expansion. The vocabulary only grows, so while documents are being
 * indexed an entry is extended with the terms added since (`scanned`) instead
 * of being recomputed; entries are dropped only when settings change.
 */
interface Entry {
  wm: WordMatch;
  w: string;
  prefix: boolean;
  k: number;
  /** charMask of the word: a term missing more than k of its characters is more than k typos away */
  mask: number;
  /** term ids already added: only while the entry is built (later scans see only new ids), then dropped to save memory */
  seen: Set<number> | null;
  scanned: number;
  nPrefix: number;
  pendingSyn: string[];
}

const caches = new WeakMap<SearchIndex, { version: number; map: Map<string, Entry> }>();

export function expandWord(ix: SearchIndex, w: string, prefix: boolean): WordMatch {
  let c = caches.get(ix);
  if (!c || c.version !== ix.settingsVersion) { c = { version: ix.settingsVersion, map: new Map() }; caches.set(ix, c); }
  const key = (prefix ? 'p:' : 'w:') + w;
  let e = c.map.get(key);
  if (!e) {
    e = computeExpansions(ix, w, prefix);
    if (c.map.size > 5000) c.map.clear();
    c.map.set(key, e);
  } else if (e.scanned < ix.terms.length) {
    for (let tid = e.scanned; tid < ix.terms.length; tid++) consider(ix, e, tid);
    e.scanned = ix.terms.length;
    for (const a of e.pendingSyn.splice(0)) addSyn(ix, e, a);
  }
  return e.wm;
}

function add(e: Entry, tid: number, typos: number, pfx: boolean): void {
  if (e.seen) { if (e.seen.has(tid)) return; e.seen.add(tid); }
  e.wm.exps.push({ tid, typos, prefix: pfx });
}

function addSyn(ix: SearchIndex, e: Entry, a: string): void {
  const tid = ix.vocab.get(a);
  if (tid !== undefined) add(e, tid, 0, false); else e.pendingSyn.push(a);
}

function popcount(v: number): number {
  v -= (v >>> 1) & 0x55555555;
  v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
  return (((v + (v >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
}

/** One edit touching the first character (the only way a first-letter typo stays within two typos). */
function firstCharEdit(w: string, t: string, prefix: boolean): boolean {
  const w1 = w.slice(1);
  const transposed = t.length >= 2 && t[0] === w[1] && t[1] === w[0];
  if (prefix) return (t.length >= w.length && t.startsWith(w1, 1)) || t.startsWith(w, 1) || t.startsWith(w1) || (transposed && t.startsWith(w.slice(2), 2));
  return (t.length === w.length && t.endsWith(w1)) || t.slice(1) === w || t === w1 || (transposed && t.length === w.length && t.endsWith(w.slice(2)));
}

/** Checks one vocabulary term against the query word: exact, prefix completion or typo variant. */
function consider(ix: SearchIndex, e: Entry, tid: number): void {
  const missing = e.mask & ~ix.termMask[tid];
  if (missing !== 0 && (e.k === 0 || (missing & (missing - 1)) !== 0 && (e.k === 1 || popcount(missing) > e.k))) return;
  if (e.seen?.has(tid)) return;
  const t = ix.terms[tid];
  const { w, k, prefix } = e;
  if (t === w) { add(e, tid, 0, false); return; }
  if (prefix && t.startsWith(w)) {
    // Short prefixes keep only the most frequent completions (k = 0: no typo scan adds the rest).
    if (k > 0 || e.nPrefix < MAX_PREFIX_TERMS) { add(e, tid, 0, true); e.nPrefix++; }
    return;
  }
  if (k === 0) return;
  if (prefix ? t.length < w.length - k : Math.abs(t.length - w.length) > k) return;
  // A first-letter typo costs two, so other first letters need k = 2 and exactly one edit at the front.
  const d = t.charCodeAt(0) === w.charCodeAt(0) ? typoDistance(w, t, k, prefix) : k >= 2 && firstCharEdit(w, t, prefix) ? 2 : k + 1;
  if (d > 0 && d <= k) { add(e, tid, d, prefix && t.length !== w.length); e.wm.highlight.push(t); }
}

function computeExpansions(ix: SearchIndex, w: string, prefix: boolean): Entry {
  const tt = ix.settings.typoTolerance;
  const numeric = /^\d+$/.test(w);
  const k = tt.enabled && !ix.noTypoWords.has(w) && !(numeric && tt.disableOnNumbers) ? allowedTypos(w.length, tt.minWordSizeForTypos.oneTypo, tt.minWordSizeForTypos.twoTypos) : 0;
  const e: Entry = { wm: { exps: [], phrases: [], highlight: [w] }, w, prefix, k, mask: charMask(w), seen: new Set(), scanned: ix.terms.length, nPrefix: 0, pendingSyn: [] };
  const exact = ix.vocab.get(w);
  if (exact !== undefined) add(e, exact, 0, false);
  if (prefix && k === 0) for (const tid of prefixTerms(ix, w)) { add(e, tid, 0, true); e.nPrefix++; }
  else if (prefix || k > 0) {
    const own = ix.byFirst.get(w.charCodeAt(0)) ?? [];
    for (const tid of own) consider(ix, e, tid);
    if (k >= 2) for (const [c, b] of ix.byFirst) if (c !== w.charCodeAt(0)) for (const tid of b) consider(ix, e, tid);
  }
  for (const alt of ix.synonyms.get(w) ?? []) {
    if (alt.length === 1) { addSyn(ix, e, alt[0]); e.wm.highlight.push(alt[0]); }
    else { e.wm.phrases.push(alt); e.wm.highlight.push(...alt); }
  }
  e.seen = null;
  return e;
}

/** Terms starting with `w` (other than `w`), at most MAX_PREFIX_TERMS of the most frequent. */
function prefixTerms(ix: SearchIndex, w: string): number[] {
  const out: number[] = [];
  const terms = ix.terms;
  for (const tid of ix.byFirst.get(w.charCodeAt(0)) ?? []) { const t = terms[tid]; if (t.length > w.length && t.startsWith(w)) out.push(tid); }
  if (out.length > MAX_PREFIX_TERMS) {
    out.sort((a, b) => ix.postings[b].n - ix.postings[a].n);
    out.length = MAX_PREFIX_TERMS;
  }
  return out;
}
