/**
 * Compact building blocks for the index: a word bitset over document slots
 * and growable typed-array lists. Typed arrays keep 100k documents' postings
 * in tens of megabytes and make candidate-set algebra a tight loop.
 */

export class Bitset {
  words: Uint32Array;
  constructor(public size: number, words?: Uint32Array) {
    this.words = words ?? new Uint32Array((size + 31) >>> 5);
  }
  static fromSlots(size: number, slots: ArrayLike<number>, n = slots.length): Bitset {
    const b = new Bitset(size);
    const w = b.words;
    for (let i = 0; i < n; i++) { const s = slots[i]; if (s < size) w[s >>> 5] |= 1 << (s & 31); }
    return b;
  }
  clone(): Bitset { return new Bitset(this.size, this.words.slice()); }
  has(i: number): boolean { return (this.words[i >>> 5] & (1 << (i & 31))) !== 0; }
  add(i: number): void { this.words[i >>> 5] |= 1 << (i & 31); }
  remove(i: number): void { this.words[i >>> 5] &= ~(1 << (i & 31)); }
  /** Grows in place (new bits clear). */
  grow(size: number): void {
    if (size <= this.size) return;
    const need = (size + 31) >>> 5;
    if (need > this.words.length) {
      const w = new Uint32Array(Math.max(need, this.words.length * 2));
      w.set(this.words);
      this.words = w;
    }
    this.size = size;
  }
  andInPlace(o: Bitset): this { const a = this.words, b = o.words; const n = Math.min(a.length, b.length); for (let i = 0; i < n; i++) a[i] &= b[i]; a.fill(0, n); return this; }
  orInPlace(o: Bitset): this { const a = this.words, b = o.words; const n = Math.min(a.length, b.length); for (let i = 0; i < n; i++) a[i] |= b[i]; return this; }
  andNotInPlace(o: Bitset): this { const a = this.words, b = o.words; const n = Math.min(a.length, b.length); for (let i = 0; i < n; i++) a[i] &= ~b[i]; return this; }
  count(): number {
    let c = 0;
    const w = this.words;
    for (let i = 0; i < w.length; i++) { let v = w[i]; if (v === 0) continue; v -= (v >>> 1) & 0x55555555; v = (v & 0x33333333) + ((v >>> 2) & 0x33333333); c += (((v + (v >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24; }
    return c;
  }
  /** Set bits in ascending order. */
  toSlots(): Uint32Array {
    const out = new Uint32Array(this.count());
    let k = 0;
    const w = this.words;
    for (let i = 0; i < w.length; i++) {
      let v = w[i];
      while (v !== 0) { const t = v & -v; out[k++] = (i << 5) + (31 - Math.clz32(t)); v ^= t; }
    }
    return out;
  }
}

/** Growable Uint32 list. */
export class U32List {
  a: Uint32Array;
  n = 0;
  constructor(cap = 4) { this.a = new Uint32Array(cap); }
  push(v: number): void {
    if (this.n === this.a.length) { const b = new Uint32Array(this.a.length * 2); b.set(this.a); this.a = b; }
    this.a[this.n++] = v;
  }
}

/** One term's postings: slot, attribute bitmask (bit = searchable attribute rank, capped at 15), term frequency. */
export class Posting {
  docs: Uint32Array;
  masks: Uint16Array;
  tfs: Uint16Array;
  n = 0;
  constructor(cap = 2) { this.docs = new Uint32Array(cap); this.masks = new Uint16Array(cap); this.tfs = new Uint16Array(cap); }
  push(slot: number, mask: number): void {
    if (this.n === this.docs.length) {
      const cap = this.n * 2;
      const d = new Uint32Array(cap); d.set(this.docs); this.docs = d;
      const m = new Uint16Array(cap); m.set(this.masks); this.masks = m;
      const t = new Uint16Array(cap); t.set(this.tfs); this.tfs = t;
    }
    this.docs[this.n] = slot; this.masks[this.n] = mask; this.tfs[this.n] = 1; this.n++;
  }
  /** Another occurrence in the document pushed last. */
  bump(mask: number): void { const i = this.n - 1; this.masks[i] |= mask; if (this.tfs[i] < 65535) this.tfs[i]++; }
}

export function growF64(a: Float64Array<ArrayBuffer>, need: number, fill = NaN): Float64Array<ArrayBuffer> {
  if (need <= a.length) return a;
  const b = new Float64Array(Math.max(need, a.length * 2)).fill(fill);
  b.set(a);
  return b;
}
export function growI32(a: Int32Array<ArrayBuffer>, need: number, fill = -1): Int32Array<ArrayBuffer> {
  if (need <= a.length) return a;
  const b = new Int32Array(Math.max(need, a.length * 2)).fill(fill);
  b.set(a);
  return b;
}
export function growU32(a: Uint32Array<ArrayBuffer>, need: number): Uint32Array<ArrayBuffer> {
  if (need <= a.length) return a;
  const b = new Uint32Array(Math.max(need, a.length * 2));
  b.set(a);
  return b;
}

/**
 * Per-slot token streams for phrase matching: term ids in text order, with
 * `-(attribute rank + 1)` before each text so phrases never span two texts.
 * Streams live in shared 1M-int blocks (no per-token objects, no doubling
 * copies of one huge array); a slot's stream is a view into its block.
 */
export class TokenStore {
  private block = new Int32Array(1 << 20);
  private used = 0;
  readonly views: (Int32Array | undefined)[] = [];
  set(slot: number, src: Int32Array, n: number): void {
    if (n > this.block.length - this.used) { this.block = new Int32Array(Math.max(1 << 20, n)); this.used = 0; }
    const v = this.block.subarray(this.used, this.used + n);
    v.set(src.subarray(0, n));
    this.used += n;
    this.views[slot] = v;
  }
  drop(slot: number): void { this.views[slot] = undefined; }
}
