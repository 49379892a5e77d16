/**
 * Candidate scoring over typed-array scratch buffers. For each query unit we
 * walk only the postings of its expansions, restricted to the candidate
 * bitset (filter ∩ live ∖ negations), keep the unit's best match per
 * document, then fold it into per-document totals used by the bucket key:
 * words matched → typos → attribute rank → BM25.
 */
import type { SearchIndex } from './index-store';
import type { Bitset, Posting } from './structs';
import type { Expansion } from './query';

const K1 = 1.2;
const B = 0.75;

export class Scratch {
  wTypo = new Uint8Array(0).fill(255);
  wAttr = new Uint8Array(0);
  wScore = new Float32Array(0);
  wTouched = new Uint32Array(0);
  wN = 0;
  dMask = new Uint16Array(0);
  dTypo = new Uint8Array(0);
  dAttr = new Uint16Array(0);
  dScore = new Float32Array(0);
  dTouched = new Uint32Array(0);
  dN = 0;
  key = new Float64Array(0);

  ensure(n: number): void {
    if (this.wTypo.length >= n) return;
    const c = Math.max(n, this.wTypo.length * 2, 1024);
    this.wTypo = new Uint8Array(c).fill(255);
    this.wAttr = new Uint8Array(c);
    this.wScore = new Float32Array(c);
    this.wTouched = new Uint32Array(c);
    this.dMask = new Uint16Array(c);
    this.dTypo = new Uint8Array(c);
    this.dAttr = new Uint16Array(c);
    this.dScore = new Float32Array(c);
    this.dTouched = new Uint32Array(c);
    this.key = new Float64Array(c);
  }

  /** Records one document match for the current unit (keeps the best one). */
  hit(slot: number, typos: number, attr: number, score: number): void {
    const t = this.wTypo[slot];
    if (t === 255) { this.wTouched[this.wN++] = slot; this.wTypo[slot] = typos; this.wAttr[slot] = attr; this.wScore[slot] = score; return; }
    if (typos < t) this.wTypo[slot] = typos;
    if (attr < this.wAttr[slot]) this.wAttr[slot] = attr;
    if (score > this.wScore[slot]) this.wScore[slot] = score;
  }

  /** Folds the current unit into the document totals; returns how many documents it matched. */
  commitUnit(bit: number): number {
    const n = this.wN;
    for (let i = 0; i < n; i++) {
      const s = this.wTouched[i];
      if (this.dMask[s] === 0) { this.dTouched[this.dN++] = s; this.dTypo[s] = 0; this.dAttr[s] = 0; this.dScore[s] = 0; }
      this.dMask[s] |= bit;
      this.dTypo[s] += this.wTypo[s];
      this.dAttr[s] += this.wAttr[s];
      this.dScore[s] += this.wScore[s];
      this.wTypo[s] = 255;
    }
    this.wN = 0;
    return n;
  }

  /** Clears document totals (keeps buffers). */
  reset(): void {
    for (let i = 0; i < this.dN; i++) this.dMask[this.dTouched[i]] = 0;
    this.dN = 0;
  }
}

export const scratch = new Scratch();

const lowestBit = (m: number) => 31 - Math.clz32(m & -m);

/** Scores one word unit's expansions over the candidates. */
export function matchWord(ix: SearchIndex, cand: Bitset, exps: Expansion[], searchMask: number, typoMask: number): void {
  const N = Math.max(ix.live, 1);
  const avg = ix.avgLen();
  const cw = cand.words;
  const dl = ix.docLen;
  for (const e of exps) {
    const p = ix.postings[e.tid];
    const idf = Math.log(1 + (N - p.n + 0.5) / (p.n + 0.5));
    const weight = e.typos ? 0.5 / e.typos : e.prefix ? 0.8 : 1;
    const needTypoAttr = e.typos > 0;
    const { docs, masks, tfs } = p;
    for (let j = 0; j < p.n; j++) {
      const s = docs[j];
      if ((cw[s >>> 5] & (1 << (s & 31))) === 0) continue;
      let m = masks[j] & searchMask;
      if (needTypoAttr) m &= typoMask;
      if (m === 0) continue;
      const tf = tfs[j];
      const score = (idf * weight * tf * (K1 + 1)) / (tf + K1 * (1 - B + (B * dl[s]) / avg));
      scratch.hit(s, e.typos, lowestBit(m), score);
    }
  }
}

/** First index ≥ i in the posting whose slot is ≥ s (galloping, then binary search). */
function seek(p: Posting, i: number, s: number): number {
  const d = p.docs;
  let step = 1, hi = i;
  while (hi < p.n && d[hi] < s) { i = hi + 1; hi += step; step <<= 1; }
  if (hi > p.n) hi = p.n;
  while (i < hi) { const m = (i + hi) >>> 1; if (d[m] < s) i = m + 1; else hi = m; }
  return i;
}

/** Lowest attribute rank (≤ 15) where the term ids occur consecutively in one text of the stream, or -1. */
function phraseIn(v: Int32Array, T: Int32Array, searchMask: number): number {
  const L = T.length, t0 = T[0], last = v.length - L;
  let best = -1;
  // Native indexOf finds the first word's occurrences; the attribute is read back from the text's separator.
  for (let i = v.indexOf(t0); i >= 0 && i <= last; i = v.indexOf(t0, i + 1)) {
    let k = 1;
    while (k < L && v[i + k] === T[k]) k++;
    if (k < L) continue;
    let j = i - 1;
    while (j > 0 && v[j] >= 0) j--;
    const r = Math.min(-v[j] - 1, 15);
    if (((1 << r) & searchMask) !== 0 && (best < 0 || r < best)) { best = r; if (r === 0) break; }
  }
  return best;
}

/**
 * Documents (within candidates) containing the words consecutively in one
 * searchable attribute: the postings are intersected starting from the rarest
 * word (galloping cursors over slot-ordered lists), and only documents having
 * every word are verified on their token stream (term ids, no text re-read).
 */
export function phraseSlots(ix: SearchIndex, cand: Bitset, ws: string[], searchMask: number): { slot: number; attr: number }[] {
  const tids = ws.map((w) => ix.vocab.get(w));
  if (tids.some((t) => t === undefined)) return [];
  const T = Int32Array.from(tids as number[]);
  const lists = [...new Set(tids as number[])].map((t) => ix.postings[t]).sort((a, b) => a.n - b.n);
  const out: { slot: number; attr: number }[] = [];
  const rare = lists[0];
  const cur = new Int32Array(lists.length);
  const cw = cand.words;
  const views = ix.tokens.views;
  for (let j = 0; j < rare.n; j++) {
    const s = rare.docs[j];
    if ((cw[s >>> 5] & (1 << (s & 31))) === 0 || (rare.masks[j] & searchMask) === 0) continue;
    let all = true;
    for (let k = 1; k < lists.length; k++) {
      const p = lists[k];
      const c = (cur[k] = seek(p, cur[k], s));
      if (c >= p.n) { j = rare.n; all = false; break; }
      if (p.docs[c] !== s || (p.masks[c] & searchMask) === 0) { all = false; break; }
    }
    if (!all) continue;
    const v = views[s];
    if (!v) continue;
    const best = phraseIn(v, T, searchMask);
    if (best >= 0) out.push({ slot: s, attr: best });
  }
  return out;
}

/** Scores a phrase unit (all words exact, consecutive). */
export function matchPhrase(ix: SearchIndex, cand: Bitset, ws: string[], searchMask: number): void {
  const N = Math.max(ix.live, 1);
  let idf = 0;
  for (const w of ws) { const t = ix.vocab.get(w); const df = t === undefined ? 0 : ix.postings[t].n; idf += Math.log(1 + (N - df + 0.5) / (df + 0.5)); }
  for (const { slot, attr } of phraseSlots(ix, cand, ws, searchMask)) scratch.hit(slot, 0, attr, idf);
}
