/**
 * Tokenizer and normaliser shared by indexing, querying, synonyms and
 * highlighting, so that the same folding applies everywhere: lower-case,
 * compatibility decomposition, and removal of diacritics on Latin letters
 * (`flûte` → `flute`), as Meilisearch's tokenizer does for Latin scripts.
 */

const WORD = /[\p{L}\p{N}\p{M}]+/gu;
const NON_ASCII = /[^\x00-\x7f]/;
const LATIN_MARKS = /(\p{Script=Latin})\p{M}+/gu;
/** Letters NFKD does not decompose but readers expect folded. */
const SPECIAL: Record<string, string> = { ß: 'ss', æ: 'ae', œ: 'oe', ø: 'o', ł: 'l', đ: 'd', ð: 'd', þ: 'th', ı: 'i' };
const SPECIAL_RE = /[ßæœøłđðþı]/g;

function slowFold(lower: string): string {
  return lower.normalize('NFKD').replace(LATIN_MARKS, '$1').replace(SPECIAL_RE, (c) => SPECIAL[c] ?? c).normalize('NFC');
}

/** Folded forms of short non-ASCII tokens (the vocabulary repeats, NFKD is costly). */
const foldCache = new Map<string, string>();

/** Folds one token (or any text) for full-text matching. */
export function fold(s: string): string {
  const lower = s.toLowerCase();
  if (!NON_ASCII.test(lower)) return lower;
  if (lower.length > 40) return slowFold(lower);
  let r = foldCache.get(lower);
  if (r === undefined) {
    r = slowFold(lower);
    if (foldCache.size >= 200_000) foldCache.clear();
    foldCache.set(lower, r);
  }
  return r;
}

export interface Token {
  /** folded form */
  norm: string;
  /** UTF-16 offsets into the original text */
  start: number;
  end: number;
}

/** Splits text into word tokens with their original offsets. */
export function tokenize(text: string): Token[] {
  const out: Token[] = [];
  // Lower-case once; per token only non-ASCII words need folding (unless lower-casing changed lengths).
  const lower = text.toLowerCase();
  const same = lower.length === text.length;
  WORD.lastIndex = 0;
  for (let m = WORD.exec(text); m; m = WORD.exec(text)) {
    const end = m.index + m[0].length;
    let norm: string;
    if (same) { norm = lower.slice(m.index, end); if (NON_ASCII.test(norm)) norm = fold(norm); } else norm = fold(m[0]);
    out.push({ norm, start: m.index, end });
  }
  return out;
}

/** Folded words only: the fast path used while indexing. */
export function words(text: string): string[] {
  const lower = text.toLowerCase();
  const ms = lower.match(WORD);
  if (!ms) return [];
  if (!NON_ASCII.test(lower)) return ms;
  return ms.map(fold);
}

/** Typos allowed for a query word of this length (Meilisearch thresholds). */
export function allowedTypos(len: number, oneTypo: number, twoTypos: number): number {
  return len >= twoTypos ? 2 : len >= oneTypo ? 1 : 0;
}

let prev2 = new Int32Array(128);
let prev = new Int32Array(128);
let cur = new Int32Array(128);

/**
 * Optimal-string-alignment distance between query word `a` and vocabulary
 * term `b`, bounded by `max` (returns max+1 when over). With `prefix`, the
 * distance to the closest prefix of `b`. A typo on the first character
 * counts as two, as Meilisearch documents, which also prunes the scan.
 */
export function typoDistance(a: string, b: string, max: number, prefix: boolean): number {
  const n = a.length;
  const m = prefix ? Math.min(b.length, n + max) : b.length;
  if (!prefix && Math.abs(n - m) > max) return max + 1;
  if (n + 2 > cur.length || m + 2 > cur.length) {
    const size = Math.max(n, m) + 2;
    prev2 = new Int32Array(size); prev = new Int32Array(size); cur = new Int32Array(size);
  }
  const firstPenalty = a.charCodeAt(0) === b.charCodeAt(0) ? 0 : 1;
  for (let j = 0; j <= m; j++) prev[j] = j;
  for (let i = 1; i <= n; i++) {
    const ca = a.charCodeAt(i - 1);
    cur[0] = i;
    let rowMin = i;
    for (let j = 1; j <= m; j++) {
      const cb = b.charCodeAt(j - 1);
      let v = prev[j - 1] + (ca === cb ? 0 : 1);
      const del = prev[j] + 1;
      const ins = cur[j - 1] + 1;
      if (del < v) v = del;
      if (ins < v) v = ins;
      if (i > 1 && j > 1 && ca === b.charCodeAt(j - 2) && a.charCodeAt(i - 2) === cb) {
        const t = prev2[j - 2] + 1;
        if (t < v) v = t;
      }
      cur[j] = v;
      if (v < rowMin) rowMin = v;
    }
    if (rowMin + firstPenalty > max) return max + 1;
    const t = prev2; prev2 = prev; prev = cur; cur = t;
  }
  let d: number;
  if (prefix) {
    d = prev[0];
    for (let j = 1; j <= m; j++) if (prev[j] < d) d = prev[j];
  } else d = prev[m];
  d += d > 0 ? firstPenalty : 0;
  return d > max ? max + 1 : d;
}
