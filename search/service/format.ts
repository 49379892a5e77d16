/**
 * Hit formatting: attributesToRetrieve ∩ displayedAttributes, `_formatted`
 * (highlight + crop; present only when asked, then holding every retrieved
 * attribute, numbers rendered as strings like Meilisearch) and
 * `_matchesPosition` (UTF-8 byte offsets). Runs only on the returned page.
 */
import { tokenize, fold, type Token } from './normalize';
import type { SearchIndex, Doc } from './index-store';
import type { SearchParams } from './params';

export interface Matcher { full: Set<string>; prefixes: string[] }

export function makeMatcher(terms: string[], prefixes: string[]): Matcher {
  return { full: new Set(terms), prefixes };
}

/** Folded characters of a token that match the query (0 = no match). */
function matchLen(m: Matcher, norm: string): number {
  if (m.full.has(norm)) return norm.length;
  let best = 0;
  for (const p of m.prefixes) if (p.length > best && norm.startsWith(p)) best = p.length;
  return best;
}

/** Original-text length whose folded form covers `n` folded characters (diacritics may shrink). */
function origLen(orig: string, n: number): number {
  for (let k = 1; k <= orig.length; k++) if (fold(orig.slice(0, k)).length >= n) return k;
  return orig.length;
}

function matchEnd(m: Matcher, text: string, t: Token): number {
  const n = matchLen(m, t.norm);
  if (!n) return -1;
  return n >= t.norm.length ? t.end : t.start + origLen(text.slice(t.start, t.end), n);
}

function highlight(text: string, m: Matcher, pre: string, post: string): string {
  let out = '';
  let last = 0;
  for (const t of tokenize(text)) {
    const e = matchEnd(m, text, t);
    if (e < 0) continue;
    out += text.slice(last, t.start) + pre + text.slice(t.start, e) + post;
    last = e;
  }
  return out + text.slice(last);
}

/** Window of `len` words maximising distinct matched words, matches centred; markers where text was cut. */
function crop(text: string, m: Matcher, len: number, marker: string): { body: string; before: string; after: string } {
  const toks = tokenize(text);
  if (toks.length <= len) return { body: text, before: '', after: '' };
  if (len === 0) return { body: '', before: marker, after: '' };
  const hits = toks.map((t) => (matchLen(m, t.norm) ? t.norm : null));
  let bestStart = 0, bestCount = 0;
  for (let i = 0; i < toks.length; i++) {
    if (!hits[i]) continue;
    const seen = new Set<string>();
    let lastHit = i;
    for (let j = i; j < Math.min(i + len, toks.length); j++) if (hits[j]) { seen.add(hits[j]!); lastHit = j; }
    if (seen.size > bestCount) {
      bestCount = seen.size;
      const spare = len - (lastHit - i + 1);
      bestStart = Math.max(0, Math.min(i - Math.floor(spare / 2), toks.length - len));
    }
  }
  const end = bestStart + len - 1;
  return {
    body: text.slice(toks[bestStart].start, toks[end].end),
    before: bestStart > 0 ? marker : '',
    after: end < toks.length - 1 ? marker : '',
  };
}

/** Does a list (`*`, `a`, `a.b`, `a*`) select top-level attribute k? */
function selects(list: string[], k: string): boolean {
  return list.some((p) => p === '*' || p === k || p.startsWith(k + '.') || (p.endsWith('*') && k.startsWith(p.slice(0, -1))));
}

function cropLengths(list: string[] | null, dflt: number): Map<string, number> {
  const out = new Map<string, number>();
  for (const a of list ?? []) {
    const i = a.lastIndexOf(':');
    const n = i > 0 ? Number(a.slice(i + 1)) : NaN;
    if (i > 0 && Number.isInteger(n) && n >= 0) out.set(a.slice(0, i), n);
    else out.set(a, dflt);
  }
  return out;
}

export function formatHit(ix: SearchIndex, doc: Doc, p: SearchParams, m: Matcher): Record<string, unknown> {
  const displayed = ix.settings.displayedAttributes;
  const keys = Object.keys(doc).filter((k) => selects(displayed, k) && selects(p.attributesToRetrieve, k));
  const hit: Record<string, unknown> = {};
  for (const k of keys) hit[k] = doc[k];
  const hl = p.attributesToHighlight ?? [];
  const crops = cropLengths(p.attributesToCrop, p.cropLength);
  if (p.attributesToHighlight || p.attributesToCrop) {
    const f: Record<string, unknown> = {};
    for (const k of keys) {
      const doHl = selects(hl, k);
      const len = crops.get(k) ?? crops.get('*');
      const fmt = (v: unknown): unknown => {
        if (typeof v === 'string') {
          let body = v, before = '', after = '';
          if (len !== undefined) ({ body, before, after } = crop(v, m, len, p.cropMarker));
          return before + (doHl ? highlight(body, m, p.highlightPreTag, p.highlightPostTag) : body) + after;
        }
        if (typeof v === 'number') return String(v);
        if (Array.isArray(v)) return v.map(fmt);
        if (v && typeof v === 'object') return Object.fromEntries(Object.entries(v).map(([a, b]) => [a, fmt(b)]));
        return v;
      };
      f[k] = fmt(doc[k]);
    }
    hit._formatted = f;
  }
  if (p.showMatchesPosition) hit._matchesPosition = matchesPosition(doc, keys, m);
  return hit;
}

function matchesPosition(doc: Doc, keys: string[], m: Matcher): Record<string, { start: number; length: number; indices?: number[] }[]> {
  const out: Record<string, { start: number; length: number; indices?: number[] }[]> = {};
  const scan = (text: string, index?: number) => {
    const found: { start: number; length: number; indices?: number[] }[] = [];
    for (const t of tokenize(text)) {
      const e = matchEnd(m, text, t);
      if (e < 0) continue;
      const start = Buffer.byteLength(text.slice(0, t.start));
      const pos: { start: number; length: number; indices?: number[] } = { start, length: Buffer.byteLength(text.slice(t.start, e)) };
      if (index !== undefined) pos.indices = [index];
      found.push(pos);
    }
    return found;
  };
  for (const k of keys) {
    const v = doc[k];
    const list = typeof v === 'string' ? scan(v) : typeof v === 'number' ? scan(String(v)) : Array.isArray(v) ? v.flatMap((x, i) => (typeof x === 'string' || typeof x === 'number' ? scan(String(x), i) : [])) : [];
    if (list.length) out[k] = list;
  }
  return out;
}
