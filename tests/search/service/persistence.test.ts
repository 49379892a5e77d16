/**
 * Contract: indexes, settings, documents and the task counter survive a
 * restart on the same dataDir, both after a clean shutdown (snapshot) and
 * from the per-task operation log alone (as after a crash).
 */
import { describe, it, expect, afterAll } from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startHarness, stopHarness, ok, ids, type Harness } from './helpers';

const dirs: string[] = [];
const tmp = () => { const d = fs.mkdtempSync(path.join(os.tmpdir(), 'windway-search-persist-')); dirs.push(d); return d; };
afterAll(() => { for (const d of dirs) fs.rmSync(d, { recursive: true, force: true }); });

async function populate(h: Harness): Promise<number> {
  const index = h.client.index('archive');
  await ok(index.addDocuments([
    { id: 1, title: 'Flûte traversière', year: 1707 },
    { id: 2, title: 'Hautboy method', year: 1695 },
    { id: 3, title: 'Bassoon reeds', year: 1787 },
  ]));
  await ok(index.updateSettings({ filterableAttributes: ['year'], sortableAttributes: ['year'], synonyms: { oboe: ['hautboy'] } }));
  await ok(index.updateDocuments([{ id: 2, year: 1696 }]));
  await ok(index.deleteDocument(3));
  const failed = await h.client.createIndex('archive').waitTask();
  expect(failed.status).toBe('failed');
  return failed.uid;
}

async function expectRestored(h: Harness, lastUid: number): Promise<void> {
  const index = h.client.index('archive');
  // Meilisearch docs — Indexes: index object keeps its primaryKey
  expect((await h.client.getIndex('archive')).primaryKey).toBe('id');
  // Meilisearch docs — Settings: settings persist with the index
  const s = await index.getSettings();
  expect(s.filterableAttributes).toEqual(['year']);
  expect(s.synonyms).toEqual({ oboe: ['hautboy'] });
  // Meilisearch docs — Documents: documents persist; updates and deletions are kept
  expect(await index.getDocument(2)).toEqual({ id: 2, title: 'Hautboy method', year: 1696 });
  expect(ids(await index.search(null, { sort: ['year:asc'] }))).toEqual([2, 1]);
  expect(ids(await index.search('flute', { filter: 'year > 1700' }))).toEqual([1]);
  expect(ids(await index.search('oboe'))).toEqual([2]);
  // Meilisearch docs — Asynchronous operations: "taskUid ... unique, incremented"; old tasks stay retrievable
  expect((await h.client.tasks.getTask(lastUid)).status).toBe('failed');
  const next = await index.addDocuments([{ id: 4, title: 'Clarinet' }]);
  expect(next.taskUid).toBe(lastUid + 1);
  await ok({ waitTask: () => h.client.tasks.waitForTask(next.taskUid) });
}

describe('persistence', () => {
  it('a clean restart reloads everything and keeps counting task uids', async () => {
    const dir = tmp();
    const a = await startHarness(dir);
    const lastUid = await populate(a);
    await stopHarness(a, false);
    expect(fs.existsSync(path.join(dir, 'indexes', 'archive', 'snapshot.jsonl'))).toBe(true);
    const b = await startHarness(dir);
    try { await expectRestored(b, lastUid); } finally { await stopHarness(b, false); }
  });

  it('state is recovered from the operation log when the process did not shut down cleanly', async () => {
    const dir = tmp();
    const a = await startHarness(dir);
    const lastUid = await populate(a);
    // A second instance reads the directory while the first never wrote its shutdown snapshot.
    const b = await startHarness(dir);
    try { await expectRestored(b, lastUid); } finally {
      await stopHarness(b, false);
      await stopHarness(a, false);
    }
  });

  it('without dataDir the service keeps everything in memory', async () => {
    const { startSearchService } = await import('@search/service/server');
    const s = await startSearchService({ port: 0 });
    const res = await fetch(`${s.url}/indexes`);
    expect(res.status).toBe(200);
    await s.close();
  });
});
