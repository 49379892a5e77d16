/**
 * Full re-index from MariaDB, safe while the app serves: settings (with fresh
 * synonyms) first, then every excerpt upserted in id order in batches (documents
 * replace themselves in place, so searches keep answering throughout), then the
 * documents whose excerpt no longer exists are deleted. The outbox worker may run at
 * the same time: both only ever send the database's current state.
 */
import { Op, QueryTypes } from 'sequelize';
import { Meilisearch } from 'meilisearch';
import { getConfig } from '@server/config';
import { getSequelize } from '@server/db';
import { Excerpt } from '@server/models';
import { getSearchClient } from './client';
import { buildDocuments } from './documents';
import { applySettings, ensureIndex, excerptsUid, waitForTask } from './settings';

export interface ReindexProgress {
  done: number;
  total: number;
  docsPerSecond: number;
  elapsedMs: number;
}

export interface ReindexResult extends ReindexProgress {
  deleted: number;
  buildMs: number;
  sendMs: number;
}

export interface ReindexOptions {
  batchSize?: number;
  /** Add tasks kept in flight while the next batch is read from the database (1: the service indexes one batch while the next is built). */
  inFlight?: number;
  onProgress?: (p: ReindexProgress) => void;
  client?: Meilisearch;
}

/** Ids of every document in the index (paged through GET /documents with `fields=id`). */
async function indexedIds(client: Meilisearch): Promise<string[]> {
  const ids: string[] = [];
  const index = client.index(excerptsUid());
  const limit = 10_000;
  for (let offset = 0; ; offset += limit) {
    const page = await index.getDocuments({ fields: ['id'], offset, limit });
    ids.push(...page.results.map((d) => String(d.id)));
    if (page.results.length < limit) return ids;
  }
}

export async function reindexAll(options: ReindexOptions = {}): Promise<ReindexResult> {
  const { MEILI_HOST, MEILI_KEY } = getConfig();
  if (!getSearchClient() || !MEILI_HOST) throw new Error('Search is not configured: set MEILI_HOST (and MEILI_KEY).');
  // Its own client: a batch keeps the service busy for seconds, longer than the app's 5 s request timeout.
  const client = options.client ?? new Meilisearch({ host: MEILI_HOST, apiKey: MEILI_KEY, timeout: 120_000 });
  const batchSize = options.batchSize ?? 2000;
  const inFlight = Math.max(1, options.inFlight ?? 1);
  const started = performance.now();
  await ensureIndex(client);
  await applySettings(client);

  const [{ n }] = await getSequelize().query<{ n: number }>('SELECT COUNT(*) AS n FROM excerpts', { type: QueryTypes.SELECT });
  const total = Number(n);
  const index = client.index(excerptsUid());
  const pending: Promise<void>[] = [];
  let done = 0;
  let lastId = 0;
  let buildMs = 0;
  const sendStarted = performance.now();
  const progress = (): ReindexProgress => {
    const elapsedMs = performance.now() - started;
    return { done, total, elapsedMs, docsPerSecond: done / Math.max(0.001, elapsedMs / 1000) };
  };

  // Keyset paging by id; the next batch is built while the service indexes the last one.
  const nextBatch = async () => {
    const rows = await Excerpt.findAll({ where: { id: { [Op.gt]: lastId } }, attributes: ['id'], order: [['id', 'ASC']], limit: batchSize, raw: true });
    if (!rows.length) return null;
    lastId = rows[rows.length - 1].id;
    const t0 = performance.now();
    const { docs } = await buildDocuments(rows.map((r) => r.id));
    buildMs += performance.now() - t0;
    return docs;
  };
  let upcoming = nextBatch();
  for (let docs = await upcoming; docs; docs = await upcoming) {
    upcoming = nextBatch();
    while (pending.length >= inFlight) await pending.shift();
    const task = await index.addDocuments(docs, { primaryKey: 'id' });
    const count = docs.length;
    pending.push(
      waitForTask(client, task.taskUid, 'indexing a batch').then(() => {
        done += count;
        options.onProgress?.(progress());
      }),
    );
  }
  await Promise.all(pending);

  // Documents of excerpts that no longer exist: compare the index with the database.
  const inIndex = await indexedIds(client);
  const existing = new Set<string>();
  for (let i = 0; i < inIndex.length; i += 5000) {
    const chunk = inIndex.slice(i, i + 5000);
    const rows = await Excerpt.findAll({ where: { publicId: chunk }, attributes: ['publicId'], raw: true });
    for (const r of rows) existing.add(r.publicId);
  }
  const stale = inIndex.filter((id) => !existing.has(id));
  if (stale.length) await waitForTask(client, (await index.deleteDocuments(stale)).taskUid, 'deleting stale documents');

  return { ...progress(), deleted: stale.length, buildMs, sendMs: performance.now() - sendStarted - buildMs };
}
