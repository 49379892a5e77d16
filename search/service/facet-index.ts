/**
 * Per-attribute structures for filtering, faceting and sorting, maintained
 * incrementally as documents are indexed. Filters are answered from
 * value→slots postings and sorted distinct values (never by scanning
 * documents); facet counts walk a per-slot forward index over the matched set.
 */
import { Bitset, U32List, growF64, growI32 } from './structs';

/** Value at a dotted path; a literal dotted key wins, arrays of objects are traversed. */
export function getPath(doc: unknown, path: string): { present: boolean; value: unknown } {
  if (doc && typeof doc === 'object' && !Array.isArray(doc) && path in (doc as object)) return { present: true, value: (doc as Record<string, unknown>)[path] };
  const dot = path.indexOf('.');
  if (dot < 0 || !doc || typeof doc !== 'object') return { present: false, value: undefined };
  const head = path.slice(0, dot);
  const rest = path.slice(dot + 1);
  const v = (doc as Record<string, unknown>)[head];
  if (Array.isArray(v)) {
    const vals: unknown[] = [];
    let present = false;
    for (const el of v) { const r = getPath(el, rest); if (r.present) { present = true; vals.push(r.value); } }
    return { present, value: vals.length === 1 ? vals[0] : vals };
  }
  return getPath(v, rest);
}

/** Scalar leaves of a value (arrays flattened; objects and null contribute none). */
export function leaves(v: unknown, out: (string | number | boolean)[] = []): (string | number | boolean)[] {
  if (Array.isArray(v)) { for (const x of v) leaves(x, out); return out; }
  if (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean') out.push(v);
  return out;
}

/** Equality key: strings compare case-insensitively (not diacritic-folded); booleans as strings. */
export function valueKey(v: string | number | boolean): string {
  return typeof v === 'number' ? 'n:' + v : 's:' + String(v).toLowerCase();
}

export class FacetField {
  readonly keyToId = new Map<string, number>();
  readonly display: (string | number)[] = [];
  readonly numeric: number[] = [];
  readonly lower: (string | null)[] = [];
  readonly postings: U32List[] = [];
  exists = new U32List();
  nulls = new U32List();
  empties = new U32List();
  /** slot → value id, -1 none, -2 several (see `multiAt`) */
  single = new Int32Array(64).fill(-1);
  /** for slots with several values: offset in `multiIds` of [count, id, id, …] (typed arrays, no per-slot objects) */
  multiAt = new Int32Array(64);
  readonly multiIds = new U32List(1024);
  private numSorted: Int32Array | null = null;
  private strSorted: Int32Array | null = null;

  constructor(readonly path: string) {}

  add(slot: number, doc: unknown): void {
    const { present, value } = getPath(doc, this.path);
    this.single = growI32(this.single, slot + 1);
    this.single[slot] = -1;
    if (!present) return;
    this.exists.push(slot);
    if (value === null) this.nulls.push(slot);
    else if (value === '' || (Array.isArray(value) && value.length === 0) || (typeof value === 'object' && !Array.isArray(value) && Object.keys(value as object).length === 0)) this.empties.push(slot);
    const ls = leaves(value);
    if (!ls.length) return;
    const ids: number[] = [];
    for (const l of ls) {
      const key = valueKey(l);
      let id = this.keyToId.get(key);
      if (id === undefined) {
        id = this.display.length;
        this.keyToId.set(key, id);
        this.display.push(typeof l === 'boolean' ? String(l) : l);
        this.numeric.push(typeof l === 'number' ? l : NaN);
        this.lower.push(typeof l === 'number' ? null : String(l).toLowerCase());
        this.postings.push(new U32List(2));
        this.numSorted = this.strSorted = null;
      }
      if (!ids.includes(id)) { ids.push(id); this.postings[id].push(slot); }
    }
    if (ids.length === 1) this.single[slot] = ids[0];
    else {
      this.single[slot] = -2;
      this.multiAt = growI32(this.multiAt, slot + 1, 0);
      this.multiAt[slot] = this.multiIds.n;
      this.multiIds.push(ids.length);
      for (const id of ids) this.multiIds.push(id);
    }
  }

  idsOf(slot: number): number[] | number {
    const s = this.single[slot];
    if (s !== -2) return s;
    const a = this.multiIds.a, at = this.multiAt[slot];
    return Array.from(a.subarray(at + 1, at + 1 + a[at]));
  }

  private orIds(size: number, ids: Iterable<number>): Bitset {
    const b = new Bitset(size);
    for (const id of ids) { const p = this.postings[id]; const w = b.words; for (let i = 0; i < p.n; i++) { const s = p.a[i]; w[s >>> 5] |= 1 << (s & 31); } }
    return b;
  }

  /** `attr = literal`: case-insensitive strings, and numbers when the literal is numeric. */
  equal(size: number, literal: string): Bitset {
    const ids: number[] = [];
    const s = this.keyToId.get('s:' + literal.toLowerCase());
    if (s !== undefined) ids.push(s);
    const num = literal.trim() === '' ? NaN : Number(literal);
    if (!Number.isNaN(num)) { const n = this.keyToId.get('n:' + num); if (n !== undefined) ids.push(n); }
    return this.orIds(size, ids);
  }

  private sortedNums(): Int32Array {
    if (!this.numSorted) {
      const ids = this.numeric.map((v, i) => (Number.isNaN(v) ? -1 : i)).filter((i) => i >= 0);
      ids.sort((a, b) => this.numeric[a] - this.numeric[b]);
      this.numSorted = Int32Array.from(ids);
    }
    return this.numSorted;
  }
  private sortedStrs(): Int32Array {
    if (!this.strSorted) {
      const ids = this.lower.map((v, i) => (v === null ? -1 : i)).filter((i) => i >= 0);
      ids.sort((a, b) => (this.lower[a]! < this.lower[b]! ? -1 : this.lower[a]! > this.lower[b]! ? 1 : 0));
      this.strSorted = Int32Array.from(ids);
    }
    return this.strSorted;
  }

  /** Inclusive/exclusive range over numbers (numeric bounds) or strings bytewise (otherwise). */
  range(size: number, lo: string | null, loIncl: boolean, hi: string | null, hiIncl: boolean): Bitset {
    const numeric = (lo === null || !Number.isNaN(Number(lo))) && (hi === null || !Number.isNaN(Number(hi))) && (lo !== null || hi !== null);
    if (numeric) {
      const ids = this.sortedNums();
      const l = lo === null ? -Infinity : Number(lo);
      const h = hi === null ? Infinity : Number(hi);
      const start = lowerBound(ids.length, (i) => this.numeric[ids[i]] < l || (!loIncl && this.numeric[ids[i]] === l));
      const out: number[] = [];
      for (let i = start; i < ids.length; i++) {
        const v = this.numeric[ids[i]];
        if (v > h || (!hiIncl && v === h)) break;
        out.push(ids[i]);
      }
      return this.orIds(size, out);
    }
    const ids = this.sortedStrs();
    const l = lo === null ? null : lo.toLowerCase();
    const h = hi === null ? null : hi.toLowerCase();
    const start = l === null ? 0 : lowerBound(ids.length, (i) => this.lower[ids[i]]! < l || (!loIncl && this.lower[ids[i]] === l));
    const out: number[] = [];
    for (let i = start; i < ids.length; i++) {
      const v = this.lower[ids[i]]!;
      if (h !== null && (v > h || (!hiIncl && v === h))) break;
      out.push(ids[i]);
    }
    return this.orIds(size, out);
  }

  slotsOf(list: U32List, size: number): Bitset { return Bitset.fromSlots(size, list.a, list.n); }
}

/** First index where pred is false (pred true for a prefix). */
function lowerBound(n: number, pred: (i: number) => boolean): number {
  let lo = 0, hi = n;
  while (lo < hi) { const mid = (lo + hi) >>> 1; if (pred(mid)) lo = mid + 1; else hi = mid; }
  return lo;
}

/** Sort keys per slot: smallest value for ascending, largest for descending; numbers before strings. */
export class SortField {
  minNum = new Float64Array(64).fill(NaN);
  maxNum = new Float64Array(64).fill(NaN);
  minStr: (string | undefined)[] = [];
  maxStr: (string | undefined)[] = [];
  constructor(readonly path: string) {}
  add(slot: number, doc: unknown): void {
    this.minNum = growF64(this.minNum, slot + 1);
    this.maxNum = growF64(this.maxNum, slot + 1);
    this.minNum[slot] = NaN; this.maxNum[slot] = NaN;
    this.minStr[slot] = undefined; this.maxStr[slot] = undefined;
    const { present, value } = getPath(doc, this.path);
    if (!present) return;
    for (const l of leaves(value)) {
      if (typeof l === 'number') {
        if (!(this.minNum[slot] <= l)) this.minNum[slot] = l;
        if (!(this.maxNum[slot] >= l)) this.maxNum[slot] = l;
      } else {
        const s = String(l).toLowerCase();
        const mi = this.minStr[slot], ma = this.maxStr[slot];
        if (mi === undefined || s < mi) this.minStr[slot] = s;
        if (ma === undefined || s > ma) this.maxStr[slot] = s;
      }
    }
  }
  /** Negative when slot a comes first. Missing values go last in both directions. */
  compare(a: number, b: number, desc: boolean): number {
    const na = desc ? this.maxNum[a] : this.minNum[a];
    const nb = desc ? this.maxNum[b] : this.minNum[b];
    const ha = !Number.isNaN(na), hb = !Number.isNaN(nb);
    if (ha && hb) return na === nb ? 0 : (na < nb ? -1 : 1) * (desc ? -1 : 1);
    if (ha !== hb) return ha ? -1 : 1;
    const sa = desc ? this.maxStr[a] : this.minStr[a];
    const sb = desc ? this.maxStr[b] : this.minStr[b];
    if (sa !== undefined && sb !== undefined) return sa === sb ? 0 : (sa < sb ? -1 : 1) * (desc ? -1 : 1);
    if ((sa === undefined) !== (sb === undefined)) return sa !== undefined ? -1 : 1;
    return 0;
  }
}
