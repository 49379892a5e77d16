/**
 * The service state: indexes, the task queue and the store. HTTP handlers
 * call these methods; every write becomes a task whose run() validates
 * first (so a failed task changes nothing), applies, then logs its op.
 */
import { ApiError, indexNotFound } from './errors';
import { SearchIndex, SLICE_MS, addSliced, emptyLike, rebuild, type Doc } from './index-store';
import { applySettingsPatch, settingsView, validateSettingsPatch, type Settings } from './settings';
import { TaskQueue } from './tasks';
import { Store, type Op } from './persistence';
import { documentsPayload, resolvePrimaryKey } from './documents';
import { runSearch } from './search';
import type { SearchParams } from './params';
import { parseFilter } from './filter-parser';
import { checkFilterable, evalFilter } from './filter-eval';

const tick = () => new Promise<void>((r) => setImmediate(r));
/** The log line of a documents op, serialised in time slices so a large batch does not stall searches. */
async function docsOpLine(head: Record<string, unknown>, docs: Doc[]): Promise<string> {
  const parts: string[] = [];
  let t = performance.now();
  for (let i = 0; i < docs.length; i++) {
    parts.push(JSON.stringify(docs[i]));
    if ((i & 15) === 15 && performance.now() - t > SLICE_MS) { await tick(); t = performance.now(); }
  }
  return `${JSON.stringify(head).slice(0, -1)},"docs":[${parts.join(',')}]}\n`;
}
const UID_RE = /^[A-Za-z0-9_-]{1,400}$/;

export class Engine {
  readonly indexes = new Map<string, SearchIndex>();
  readonly queue = new TaskQueue();
  private readonly lastTask = new Map<string, number>();

  constructor(private readonly store: Store | null) {
    this.queue.onIdle = () => this.persistIdle();
    if (store) this.load(store);
  }

  // ---- persistence ---------------------------------------------------------
  private load(store: Store): void {
    const saved = store.loadTasks();
    let maxTask = -1;
    for (const { meta, docs, ops } of store.readIndexes()) {
      let ix = new SearchIndex(meta.uid);
      Object.assign(ix, { primaryKey: meta.primaryKey, createdAt: meta.createdAt, settings: meta.settings });
      ix.applyDerived();
      for (let i = 0; i < docs.length; i += 5000) ix.addDocuments(docs.slice(i, i + 5000), 'replace');
      maxTask = Math.max(maxTask, meta.lastTask);
      for (const op of ops) {
        if (op.t === 'docs') { ix.primaryKey = op.pk; ix.addDocuments(op.docs, op.mode); }
        else if (op.t === 'delete') ix.deleteIds(op.ids);
        else if (op.t === 'clear') ix = emptyLike(ix);
        else { const s = structuredClone(ix.settings); applySettingsPatch(s, op.patch); ix = this.rebuildSync(ix, s); }
        maxTask = Math.max(maxTask, op.task);
      }
      ix.updatedAt = meta.updatedAt;
      this.indexes.set(ix.uid, ix);
      this.lastTask.set(ix.uid, ops.length ? ops[ops.length - 1].task : meta.lastTask);
    }
    if (saved) this.queue.restore(saved);
    this.queue.nextUid = Math.max(this.queue.nextUid, maxTask + 1);
  }

  private rebuildSync(old: SearchIndex, s: Settings): SearchIndex {
    const n = emptyLike(old, s);
    const slots = old.liveSlots();
    n.addDocuments(Array.from(slots, (x) => old.docs[x]!), 'replace');
    return n;
  }

  private log(uid: string, op: Op): void {
    this.lastTask.set(uid, op.task);
    this.store?.appendOp(uid, op);
  }

  /** After a burst of tasks: compact big logs, save the task history. */
  private async persistIdle(): Promise<void> {
    if (!this.store) return;
    for (const ix of this.indexes.values()) {
      if (ix.needsCompaction()) this.indexes.set(ix.uid, await rebuild(ix, ix.settings, tick));
      if (this.store.shouldCompact(ix.uid)) await this.store.snapshot(this.indexes.get(ix.uid)!, this.lastTask.get(ix.uid) ?? -1);
    }
    this.store.saveTasks(this.queue.snapshot());
  }

  /** Shutdown: finish queued tasks, then write snapshots so the next start needs no log replay. */
  async flush(): Promise<void> {
    await this.queue.drain();
    if (!this.store) return;
    for (const ix of this.indexes.values()) if (this.store.hasLog(ix.uid)) await this.store.snapshot(ix, this.lastTask.get(ix.uid) ?? -1, false);
    this.store.saveTasks(this.queue.snapshot());
  }

  // ---- indexes -------------------------------------------------------------
  index(uid: string): SearchIndex {
    const ix = this.indexes.get(uid);
    if (!ix) throw indexNotFound(uid);
    return ix;
  }

  indexView(ix: SearchIndex): Record<string, unknown> {
    return { uid: ix.uid, primaryKey: ix.primaryKey, createdAt: ix.createdAt, updatedAt: ix.updatedAt };
  }

  private checkUid(uid: unknown): string {
    if (typeof uid !== 'string' || !UID_RE.test(uid)) throw new ApiError('invalid_index_uid', `\`${String(uid)}\` is not a valid index uid. Index uid can be an integer or a string containing only alphanumeric characters, hyphens (-) and underscores (_), and can not be more than 512 bytes.`);
    return uid;
  }

  /** Creates the index if missing (document additions and settings updates do that in Meilisearch). */
  private ensure(uid: string, taskUid: number, primaryKey: string | null = null): SearchIndex {
    let ix = this.indexes.get(uid);
    if (!ix) {
      ix = new SearchIndex(uid);
      ix.primaryKey = primaryKey;
      ix.applyDerived();
      this.indexes.set(uid, ix);
      // The creating task's own op (if any) is logged after this, so the snapshot predates it.
      this.lastTask.set(uid, taskUid - 1);
      void this.store?.snapshot(ix, taskUid - 1, false);
    }
    return ix;
  }

  createIndex(body: unknown): Record<string, unknown> {
    const b = (body ?? {}) as { uid?: unknown; primaryKey?: unknown };
    const uid = this.checkUid(b.uid);
    const pk = typeof b.primaryKey === 'string' ? b.primaryKey : null;
    return this.queue.enqueue(uid, 'indexCreation', { primaryKey: pk }, async (task) => {
      if (this.indexes.has(uid)) throw new ApiError('index_already_exists', `Index \`${uid}\` already exists.`);
      this.ensure(uid, task.uid, pk);
    });
  }

  deleteIndex(uid: string): Record<string, unknown> {
    return this.queue.enqueue(uid, 'indexDeletion', { deletedDocuments: null }, async () => {
      const ix = this.index(uid);
      this.indexes.delete(uid);
      this.store?.deleteIndex(uid);
      return { deletedDocuments: ix.live };
    }, { deletedDocuments: 0 });
  }

  getSettings(uid: string): Record<string, unknown> { return settingsView(this.index(uid).settings); }

  updateSettings(uid: string, body: unknown): Record<string, unknown> {
    this.checkUid(uid);
    const patch = validateSettingsPatch(body);
    return this.queue.enqueue(uid, 'settingsUpdate', patch, async (task) => {
      const ix = this.ensure(uid, task.uid);
      const s = structuredClone(ix.settings);
      const { reindex } = applySettingsPatch(s, patch);
      if (reindex) this.indexes.set(uid, await rebuild(ix, s, tick));
      else { ix.settings = s; ix.applyDerived(); ix.touch(); }
      this.log(uid, { t: 'settings', task: task.uid, patch });
    });
  }

  // ---- documents -----------------------------------------------------------
  addDocuments(uid: string, body: unknown, mode: 'replace' | 'update', primaryKey: string | null): Record<string, unknown> {
    this.checkUid(uid);
    const docs = documentsPayload(body);
    return this.queue.enqueue(uid, 'documentAdditionOrUpdate', { receivedDocuments: docs.length, indexedDocuments: null }, async (task) => {
      const ix = this.indexes.get(uid) ?? new SearchIndex(uid);
      const pk = resolvePrimaryKey(ix, docs, primaryKey);
      const target = this.ensure(uid, task.uid, pk || null);
      if (pk) target.primaryKey = pk;
      // Time-sliced (a few ms per slice), so searches keep answering while a large batch is indexed.
      await addSliced(target, docs, mode, tick);
      if (docs.length) {
        this.lastTask.set(uid, task.uid);
        if (this.store) this.store.appendLine(uid, await docsOpLine({ t: 'docs', task: task.uid, mode, pk }, docs));
      }
      return { receivedDocuments: docs.length, indexedDocuments: docs.length };
    }, { indexedDocuments: 0 });
  }

  deleteDocuments(uid: string, ids: unknown[]): Record<string, unknown> {
    const keys = ids.map((v) => (typeof v === 'number' ? String(v) : typeof v === 'string' ? v : JSON.stringify(v)));
    return this.queue.enqueue(uid, 'documentDeletion', { providedIds: keys.length, deletedDocuments: null, originalFilter: null }, async (task) => {
      const ix = this.index(uid);
      const n = ix.deleteIds(keys);
      this.log(uid, { t: 'delete', task: task.uid, ids: keys });
      return { providedIds: keys.length, deletedDocuments: n, originalFilter: null };
    }, { deletedDocuments: 0 });
  }

  deleteByFilter(uid: string, filter: unknown): Record<string, unknown> {
    return this.queue.enqueue(uid, 'documentDeletion', { providedIds: 0, deletedDocuments: null, originalFilter: JSON.stringify(filter) }, async (task) => {
      const ix = this.index(uid);
      const ast = parseFilter(filter);
      if (!ast) throw new ApiError('invalid_document_filter', 'Sending an empty filter is forbidden.');
      checkFilterable(ix, ast);
      const ids = Array.from(evalFilter(ix, ast).toSlots(), (s) => ix.idOf[s]);
      const n = ix.deleteIds(ids);
      this.log(uid, { t: 'delete', task: task.uid, ids });
      return { providedIds: 0, deletedDocuments: n, originalFilter: JSON.stringify(filter) };
    }, { deletedDocuments: 0 });
  }

  deleteAll(uid: string): Record<string, unknown> {
    return this.queue.enqueue(uid, 'documentDeletion', { providedIds: 0, deletedDocuments: null, originalFilter: null }, async (task) => {
      const ix = this.index(uid);
      const n = ix.live;
      this.indexes.set(uid, emptyLike(ix));
      this.log(uid, { t: 'clear', task: task.uid });
      return { providedIds: 0, deletedDocuments: n, originalFilter: null };
    }, { deletedDocuments: 0 });
  }

  getDocument(uid: string, id: string, fields: string[] | null): Doc {
    const ix = this.index(uid);
    const slot = ix.idToSlot.get(id);
    if (slot === undefined) throw new ApiError('document_not_found', `Document \`${id}\` not found.`);
    return this.pick(ix, ix.docs[slot]!, fields);
  }

  getDocuments(uid: string, offset: number, limit: number, fields: string[] | null): Record<string, unknown> {
    const ix = this.index(uid);
    const slots = ix.liveSlots();
    const results = Array.from(slots.subarray(offset, offset + limit), (s) => this.pick(ix, ix.docs[s]!, fields));
    return { results, offset, limit, total: ix.live };
  }

  private pick(ix: SearchIndex, doc: Doc, fields: string[] | null): Doc {
    const shown = ix.settings.displayedAttributes;
    const out: Doc = {};
    for (const [k, v] of Object.entries(doc)) {
      if (!shown.includes('*') && !shown.includes(k)) continue;
      if (fields && !fields.includes('*') && !fields.includes(k)) continue;
      out[k] = v;
    }
    return out;
  }

  stats(uid: string): Record<string, unknown> {
    const ix = this.index(uid);
    const fieldDistribution: Record<string, number> = {};
    for (const s of ix.alive.toSlots()) for (const k of Object.keys(ix.docs[s]!)) fieldDistribution[k] = (fieldDistribution[k] ?? 0) + 1;
    return { numberOfDocuments: ix.live, isIndexing: false, fieldDistribution };
  }

  search(uid: string, p: SearchParams): Record<string, unknown> {
    return runSearch(this.index(uid), p);
  }
}

