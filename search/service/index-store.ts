/**
 * One index: documents, the inverted index and the filter/sort structures.
 *
 * Documents live in "slots" (dense integers). Replacing or deleting a
 * document kills its slot in the `alive` bitset instead of rewriting
 * postings; every candidate set is intersected with `alive`, and the index
 * is rebuilt into fresh slots when too many are dead or when searchable /
 * filterable / sortable settings change.
 */
import { defaultSettings, attrMatches, type Settings } from './settings';
import { Bitset, Posting, TokenStore, growF64, growI32, growU32 } from './structs';
import { FacetField, SortField, getPath } from './facet-index';
import { words } from './normalize';

export type Doc = Record<string, unknown>;

/** Which characters occur in a term (a–z one bit each, others hashed into 6 bits). */
export function charMask(t: string): number {
  let m = 0;
  for (let i = 0; i < t.length; i++) { const c = t.charCodeAt(i) - 97; m |= 1 << (c >= 0 && c < 26 ? c : 26 + ((c + 97) % 6)); }
  return m >>> 0;
}

/** Text of every scalar inside a value (objects and arrays flattened). */
function textLeaves(v: unknown, out: string[]): void {
  if (v === null || v === undefined) return;
  if (typeof v === 'string') out.push(v);
  else if (typeof v === 'number' || typeof v === 'boolean') out.push(String(v));
  else if (Array.isArray(v)) for (const x of v) textLeaves(x, out);
  else if (typeof v === 'object') for (const x of Object.values(v as object)) textLeaves(x, out);
}

export class SearchIndex {
  primaryKey: string | null = null;
  createdAt = new Date().toISOString();
  updatedAt = this.createdAt;
  settings: Settings = defaultSettings();

  // documents
  docs: (Doc | undefined)[] = [];
  idOf: string[] = [];
  readonly idToSlot = new Map<string, number>();
  order = new Float64Array(1024);
  nextOrder = 0;
  alive = new Bitset(0);
  slots = 0;
  live = 0;

  // text
  /** searchable attribute names in rank order (discovered order when searchable is `*`) */
  fields: string[] = [];
  readonly vocab = new Map<string, number>();
  readonly terms: string[] = [];
  readonly postings: Posting[] = [];
  private lastSlot = new Int32Array(1024).fill(-1);
  /** term ids bucketed by first character, for typo scans */
  readonly byFirst = new Map<number, number[]>();
  /** per term: bitmask of its characters (charMask), a cheap typo pre-filter */
  termMask = new Uint32Array(1024);
  docLen = new Uint32Array(1024);
  totalLen = 0;
  /** per-slot token streams (phrase verification) */
  readonly tokens = new TokenStore();
  private tokBuf = new Int32Array(4096);

  readonly facets = new Map<string, FacetField>();
  readonly sorts = new Map<string, SortField>();

  /** bumped on every write; caches key on it */
  version = 0;
  /** bumped when settings-derived lookups change (query expansion caches key on it) */
  settingsVersion = 0;
  /** derived from settings */
  stopSet = new Set<string>();
  synonyms = new Map<string, string[][]>();
  noTypoWords = new Set<string>();

  constructor(readonly uid: string) {}

  /** Rebuilds settings-derived lookups (normalised the same way as text). */
  applyDerived(): void {
    const s = this.settings;
    if (!s.searchableAttributes.includes('*')) this.fields = [...s.searchableAttributes];
    this.stopSet = new Set(s.stopWords.flatMap((w) => words(w)));
    this.noTypoWords = new Set(s.typoTolerance.disableOnWords.flatMap((w) => words(w)));
    this.synonyms = new Map();
    for (const [k, alts] of Object.entries(s.synonyms)) {
      const key = words(k).join(' ');
      if (!key) continue;
      const list = this.synonyms.get(key) ?? [];
      for (const a of alts) { const t = words(a); if (t.length && t.join(' ') !== key) list.push(t); }
      this.synonyms.set(key, list);
    }
    for (const f of s.filterableAttributes) if (!f.includes('*')) this.facet(f);
    for (const f of s.sortableAttributes) if (!this.sorts.has(f)) this.sorts.set(f, this.fillField(new SortField(f)));
    this.version++;
    this.settingsVersion++;
  }

  private fillField<T extends { add(slot: number, doc: unknown): void }>(f: T): T {
    for (let s = 0; s < this.slots; s++) { const d = this.docs[s]; if (d) f.add(s, d); }
    return f;
  }

  /** The facet structure for a filterable path, built on first use for nested paths. */
  facet(path: string): FacetField | null {
    let f = this.facets.get(path);
    if (!f) {
      if (!attrMatches(this.settings.filterableAttributes, path)) return null;
      f = this.fillField(new FacetField(path));
      this.facets.set(path, f);
    }
    return f;
  }

  /** The sort structure for a sortable path, built on first use for nested or pattern-matched paths. */
  sortField(path: string): SortField | null {
    let f = this.sorts.get(path);
    if (!f) {
      if (!attrMatches(this.settings.sortableAttributes, path)) return null;
      f = this.fillField(new SortField(path));
      this.sorts.set(path, f);
    }
    return f;
  }

  /** Rank of a searchable attribute, or -1 when not searchable. */
  fieldRank(name: string): number {
    const i = this.fields.indexOf(name);
    if (i >= 0) return i;
    if (this.settings.searchableAttributes.includes('*')) { this.fields.push(name); return this.fields.length - 1; }
    return -1;
  }

  /** Bitmask of attribute ranks for attribute names (nested names map to their searchable parent). */
  maskOf(names: string[]): number {
    let m = 0;
    this.fields.forEach((f, i) => { if (names.some((n) => n === f || f.startsWith(n + '.') || n.startsWith(f + '.'))) m |= 1 << Math.min(i, 15); });
    return m;
  }

  private newTerm(t: string): number {
    const id = this.terms.length;
    this.vocab.set(t, id);
    this.terms.push(t);
    this.postings.push(new Posting());
    this.lastSlot = growI32(this.lastSlot, id + 1);
    this.termMask = growU32(this.termMask, id + 1);
    this.termMask[id] = charMask(t);
    const c = t.charCodeAt(0);
    const b = this.byFirst.get(c);
    if (b) b.push(id); else this.byFirst.set(c, [id]);
    return id;
  }

  /** Searchable text of a document as [attribute rank, strings] pairs. */
  fieldTexts(doc: Doc): [number, string[]][] {
    const s = this.settings.searchableAttributes;
    const parts: [number, string[]][] = [];
    if (s.includes('*')) {
      for (const [k, v] of Object.entries(doc)) { const out: string[] = []; textLeaves(v, out); if (out.length) parts.push([this.fieldRank(k), out]); }
    } else {
      if (this.fields.length !== s.length) this.fields = [...s];
      s.forEach((a, i) => { const { present, value } = getPath(doc, a); if (present) { const out: string[] = []; textLeaves(value, out); if (out.length) parts.push([i, out]); } });
    }
    return parts;
  }

  /** Tokenizes each text once: postings, document length and the token stream in one pass. */
  private indexText(slot: number, doc: Doc): void {
    const parts = this.fieldTexts(doc);
    let len = 0;
    let buf = this.tokBuf;
    let n = 0;
    for (const [rank, texts] of parts) {
      const bit = 1 << Math.min(rank, 15);
      for (const text of texts) {
        const ws = words(text);
        if (n + ws.length + 1 > buf.length) buf = this.tokBuf = growI32(buf, n + ws.length + 1);
        buf[n++] = -(rank + 1);
        for (let i = 0; i < ws.length; i++) {
          const w = ws[i];
          let id = this.vocab.get(w);
          if (id === undefined) id = this.newTerm(w);
          if (this.lastSlot[id] === slot) this.postings[id].bump(bit);
          else { this.postings[id].push(slot, bit); this.lastSlot[id] = slot; }
          buf[n++] = id;
        }
        len += ws.length;
      }
    }
    this.tokens.set(slot, buf, n);
    this.docLen = growU32(this.docLen, slot + 1);
    this.docLen[slot] = len;
    this.totalLen += len;
  }

  private kill(slot: number): void {
    this.alive.remove(slot);
    this.tokens.drop(slot);
    this.totalLen -= this.docLen[slot];
    this.docs[slot] = undefined;
    this.live--;
  }

  /** Adds (replace) or merges (update) already-validated documents. */
  addDocuments(batch: Doc[], mode: 'replace' | 'update'): number {
    for (const incoming of batch) this.addDocument(incoming, mode);
    this.touch();
    return batch.length;
  }

  /** Adds or merges one document; the caller calls touch() after a run of these. */
  addDocument(incoming: Doc, mode: 'replace' | 'update'): void {
    const pk = this.primaryKey!;
    {
      const id = String(incoming[pk]);
      const old = this.idToSlot.get(id);
      let doc = incoming;
      let ord = this.nextOrder;
      if (old !== undefined) {
        if (mode === 'update') doc = { ...this.docs[old], ...incoming };
        ord = this.order[old];
        this.kill(old);
      } else this.nextOrder++;
      const slot = this.slots++;
      this.alive.grow(this.slots);
      this.alive.add(slot);
      this.order = growF64(this.order, this.slots);
      this.order[slot] = ord;
      this.docs[slot] = doc;
      this.idOf[slot] = id;
      this.idToSlot.set(id, slot);
      this.live++;
      this.indexText(slot, doc);
      for (const f of this.facets.values()) f.add(slot, doc);
      for (const f of this.sorts.values()) f.add(slot, doc);
    }
  }

  deleteIds(ids: string[]): number {
    let n = 0;
    for (const id of ids) {
      const slot = this.idToSlot.get(id);
      if (slot === undefined) continue;
      this.kill(slot);
      this.idToSlot.delete(id);
      n++;
    }
    this.touch();
    return n;
  }

  touch(): void { this.version++; this.updatedAt = new Date().toISOString(); }

  /** Live documents in their stable order (insertion order; replacing keeps a document's place). */
  liveSlots(): Uint32Array {
    const s = this.alive.toSlots();
    const o = this.order;
    return s.sort((a, b) => o[a] - o[b]);
  }

  /** Worth rebuilding into dense slots? */
  needsCompaction(): boolean { return this.slots > 10_000 && this.slots - this.live > this.live; }

  avgLen(): number { return this.live ? Math.max(1, this.totalLen / this.live) : 1; }
}

/** A fresh index with the same identity and settings; documents are added by the caller in chunks. */
export function emptyLike(old: SearchIndex, settings: Settings = old.settings): SearchIndex {
  const n = new SearchIndex(old.uid);
  n.primaryKey = old.primaryKey;
  n.createdAt = old.createdAt;
  n.updatedAt = new Date().toISOString();
  n.settings = settings;
  n.applyDerived();
  return n;
}

/** Rebuilds an index (new settings or compaction), yielding between chunks so searches keep flowing. */
export async function rebuild(old: SearchIndex, settings: Settings, yieldFn: () => Promise<void>): Promise<SearchIndex> {
  const n = emptyLike(old, settings);
  const slots = old.liveSlots();
  await addSliced(n, Array.from(slots, (s) => old.docs[s]!), 'replace', yieldFn);
  return n;
}

/** Work done between two yields to the event loop while indexing (searches wait at most about this long). */
export const SLICE_MS = 8;

/** Adds documents in time slices of SLICE_MS, yielding in between so searches keep answering. */
export async function addSliced(ix: SearchIndex, docs: Doc[], mode: 'replace' | 'update', yieldFn: () => Promise<void>): Promise<void> {
  let i = 0;
  while (i < docs.length) {
    const t = performance.now();
    do ix.addDocument(docs[i++], mode);
    while (i < docs.length && ((i & 3) !== 0 || performance.now() - t < SLICE_MS));
    ix.touch();
    if (i < docs.length) await yieldFn();
  }
}

