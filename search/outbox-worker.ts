/**
 * The search outbox worker: the database is the truth, and the index catches up
 * from `search_outbox`.
 *
 * - One drainer at a time across all app processes (a MariaDB named lock), so two
 *   workers never send different versions of one excerpt out of order; the rows are
 *   also claimed with `FOR UPDATE SKIP LOCKED` in a READ COMMITTED transaction (no gap
 *   locks: writers keep inserting outbox rows while a batch is in flight).
 * - A row says *what* changed, not what to send: the worker reads the entity's state
 *   now and sends that (an excerpt row re-indexes or deletes that excerpt; a source row
 *   re-indexes all its excerpts and deletes documents of excerpts it no longer has).
 * - Success deletes the rows. Failure (service down, task failed) keeps them with
 *   `attempts + 1`, `last_error` and `available_at` pushed back exponentially
 *   (2, 4, 8 … up to 300 s). Writes never wait for search.
 */
import { QueryTypes, Transaction } from 'sequelize';
import type { Meilisearch } from 'meilisearch';
import { getSequelize } from '@server/db';
import { Excerpt } from '@server/models';
import { getSearchClient } from './client';
import { buildDocuments } from './documents';
import { ensureIndex, excerptsUid, waitForTask } from './settings';
import { reindexAll } from './indexer';

export const BATCH_SIZE = 200;
const MAX_BACKOFF_S = 300;
const LOCK_NAME = 'windway_search_outbox';

interface OutboxRow {
  id: number;
  entity_type: 'source' | 'excerpt';
  entity_id: number;
  operation: 'upsert' | 'delete';
  attempts: number;
}

export interface DrainResult {
  /** Rows synced and removed. */
  synced: number;
  /** Rows kept for a retry. */
  failed: number;
  /** Documents sent (adds) and deleted. */
  added: number;
  deleted: number;
  /** True when another process held the drain lock. */
  busy: boolean;
  error?: string;
}

/** Ids of documents in the index for a source (found through its row id, which survives deletion). */
async function documentIdsOfSource(client: Meilisearch, sourceRowId: number): Promise<string[]> {
  const ids: string[] = [];
  const index = client.index(excerptsUid());
  for (let page = 1; ; page++) {
    const res = await index.search(null, { filter: `sourceRowId = ${Number(sourceRowId)}`, attributesToRetrieve: ['id'], hitsPerPage: 1000, page });
    ids.push(...res.hits.map((h) => String(h.id)));
    if (res.hits.length < 1000 || page >= (res.totalPages ?? 1)) return ids;
  }
}

async function documentIdsOfExcerpts(client: Meilisearch, rowIds: number[]): Promise<string[]> {
  if (!rowIds.length) return [];
  const res = await client.index(excerptsUid()).search(null, {
    filter: `rowId IN [${rowIds.map((id) => Number(id)).join(', ')}]`,
    attributesToRetrieve: ['id'],
    limit: rowIds.length,
  });
  return res.hits.map((h) => String(h.id));
}

/** Brings the index in line with the database for these outbox rows. */
async function sync(client: Meilisearch, rows: OutboxRow[], transaction: Transaction) {
  await ensureIndex(client);
  const excerptIds = new Set<number>();
  const sourceIds = new Set<number>();
  for (const row of rows) (row.entity_type === 'source' ? sourceIds : excerptIds).add(row.entity_id);

  const toDelete = new Set<string>();
  if (sourceIds.size) {
    const current = await Excerpt.findAll({ where: { sourceId: [...sourceIds] }, attributes: ['id', 'publicId'], transaction });
    for (const e of current) excerptIds.add(e.id);
    const alive = new Set(current.map((e) => e.publicId));
    for (const sourceId of sourceIds) {
      for (const id of await documentIdsOfSource(client, sourceId)) if (!alive.has(id)) toDelete.add(id);
    }
  }
  const { docs, missing } = await buildDocuments([...excerptIds], transaction);
  for (const id of await documentIdsOfExcerpts(client, missing)) toDelete.add(id);

  const index = client.index(excerptsUid());
  if (docs.length) await waitForTask(client, (await index.addDocuments(docs, { primaryKey: 'id' })).taskUid, 'adding documents');
  if (toDelete.size) await waitForTask(client, (await index.deleteDocuments([...toDelete])).taskUid, 'deleting documents');
  return { added: docs.length, deleted: toDelete.size };
}

const message = (error: unknown) => (error instanceof Error ? `${error.name}: ${error.message}` : String(error)).slice(0, 1000);

/** Drains one batch of due outbox rows. Never throws for search trouble: the rows stay for a retry. */
export async function drainOnce(batchSize = BATCH_SIZE): Promise<DrainResult> {
  const result: DrainResult = { synced: 0, failed: 0, added: 0, deleted: 0, busy: false };
  const client = getSearchClient();
  if (!client) return result;
  const sequelize = getSequelize();
  return sequelize.transaction({ isolationLevel: Transaction.ISOLATION_LEVELS.READ_COMMITTED }, async (transaction) => {
    const [lock] = await sequelize.query<{ got: number | null }>('SELECT GET_LOCK(?, 0) AS got', { replacements: [LOCK_NAME], type: QueryTypes.SELECT, transaction });
    if (Number(lock?.got) !== 1) return { ...result, busy: true };
    try {
      const rows = await sequelize.query<OutboxRow>(
        `SELECT id, entity_type, entity_id, operation, attempts FROM search_outbox
          WHERE available_at <= UTC_TIMESTAMP() ORDER BY id LIMIT ${Math.max(1, Math.floor(batchSize))} FOR UPDATE SKIP LOCKED`,
        { type: QueryTypes.SELECT, transaction },
      );
      if (!rows.length) return result;
      const ids = rows.map((r) => r.id);
      try {
        const sent = await sync(client, rows, transaction);
        await sequelize.query('DELETE FROM search_outbox WHERE id IN (?)', { replacements: [ids], transaction });
        return { ...result, ...sent, synced: rows.length };
      } catch (error) {
        // MariaDB runs SET assignments left to right: `attempts` in the backoff is the new count.
        await sequelize.query(
          `UPDATE search_outbox SET attempts = attempts + 1, last_error = ?,
             available_at = DATE_ADD(UTC_TIMESTAMP(), INTERVAL LEAST(?, POW(2, attempts)) SECOND)
           WHERE id IN (?)`,
          { replacements: [message(error), MAX_BACKOFF_S, ids], transaction },
        );
        return { ...result, failed: rows.length, error: message(error) };
      }
    } finally {
      await sequelize.query('SELECT RELEASE_LOCK(?)', { replacements: [LOCK_NAME], transaction });
    }
  });
}

/** Drains until nothing is due (tests and the re-index use it). */
export async function drainAll(batchSize = BATCH_SIZE): Promise<DrainResult> {
  const total: DrainResult = { synced: 0, failed: 0, added: 0, deleted: 0, busy: false };
  for (;;) {
    const r = await drainOnce(batchSize);
    total.synced += r.synced;
    total.failed += r.failed;
    total.added += r.added;
    total.deleted += r.deleted;
    total.busy ||= r.busy;
    if (r.error) total.error = r.error;
    if (r.busy || r.failed || r.synced < batchSize) return total;
  }
}

/** Outbox rows that failed at least once and have waited longer than `olderThanS` (for health). */
export async function staleOutboxRows(olderThanS = 60): Promise<number> {
  const [row] = await getSequelize().query<{ n: number }>(
    'SELECT COUNT(*) AS n FROM search_outbox WHERE attempts > 0 AND created_at < DATE_SUB(UTC_TIMESTAMP(), INTERVAL ? SECOND)',
    { replacements: [olderThanS], type: QueryTypes.SELECT },
  );
  return Number(row?.n ?? 0);
}

/**
 * The background job: drains every `intervalMs` (at once again while there is more),
 * logs failures once per streak. Returns its stop function.
 */
export function startOutboxWorker(options: { intervalMs?: number; log?: (line: string) => void } = {}): () => Promise<void> {
  const intervalMs = options.intervalMs ?? 1000;
  const log = options.log ?? ((line: string) => console.warn(`[search] ${line}`));
  let stopped = false;
  let timer: NodeJS.Timeout | undefined;
  let running: Promise<void> | undefined;
  let failing = false;

  const tick = async () => {
    let again = false;
    try {
      // A fresh install or a wiped search service: the index is created, then filled from the database.
      const client = getSearchClient();
      if (client && (await ensureIndex(client))) {
        const r = await reindexAll();
        log(`search index was missing: rebuilt ${r.done} documents in ${(r.elapsedMs / 1000).toFixed(1)} s`);
      }
      const r = await drainOnce();
      if (r.error && !failing) log(`search sync failed, will retry: ${r.error}`);
      if (!r.error && failing) log('search sync recovered');
      failing = !!r.error;
      again = !r.error && !r.busy && r.synced >= BATCH_SIZE;
    } catch (error) {
      if (!failing) log(`search outbox unavailable: ${message(error)}`);
      failing = true;
    }
    if (!stopped) timer = setTimeout(() => (running = tick()), again ? 0 : intervalMs);
  };
  timer = setTimeout(() => (running = tick()), intervalMs);
  return async () => {
    stopped = true;
    clearTimeout(timer);
    await running;
  };
}
