import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { SearchOutbox } from '@server/models';
import { resetConfigCache } from '@server/config';
import { freePort } from '@server/cli/mariadb';
import { resetSearchClient } from '@search/client';
import { drainOnce } from '@search/outbox-worker';
import { reindexAll } from '@search/indexer';
import { getSearchClient } from '@search/client';
import { excerptsUid, waitForTask } from '@search/settings';
import { anonymous, createUser } from '../support/http';
import {
  deleteExcerpt, deleteSource, editExcerpt, expectedDocuments, indexedDocuments, makeExcerpt, makeSource, syncSearch,
} from './catalogue-factory';

/** The index equals the database: same ids, and each document is what the builder makes from the rows now. */
async function expectIndexEqualsDatabase() {
  const [indexed, expected] = await Promise.all([indexedDocuments(), expectedDocuments()]);
  expect([...indexed.keys()].sort()).toEqual([...expected.keys()].sort());
  for (const [id, doc] of expected) expect(indexed.get(id)).toEqual(JSON.parse(JSON.stringify(doc)));
}

const realHost = process.env.MEILI_HOST;
async function searchGoesDown() {
  process.env.MEILI_HOST = `http://127.0.0.1:${await freePort()}`;
  resetConfigCache();
  resetSearchClient();
}
function searchComesBack() {
  process.env.MEILI_HOST = realHost;
  resetConfigCache();
  resetSearchClient();
}

let contributorId: number;
beforeAll(async () => {
  contributorId = (await createUser('contributor')).id;
});
afterEach(searchComesBack);

describe('search outbox', () => {
  it('indexes created sources and excerpts, public and draft', async () => {
    const source = await makeSource({ contributorId, title: 'Principes de la flûte' , languages: ['fr'] });
    await makeExcerpt(source, { diplomatic: 'La flûte à bec se tient droite', mentions: [{ term: 'flûte à bec', sizeSlug: 'alto', language: 'fr' }], pitch: [392] });
    await makeExcerpt(source, { diplomatic: 'A draft passage on the tenor', status: 'draft', mentions: [{ term: 'tenor', sizeSlug: 'tenor' }] });
    await syncSearch();
    await expectIndexEqualsDatabase();
    const docs = [...(await indexedDocuments()).values()];
    expect(docs.map((d) => d.visibility).sort()).toEqual(['draft', 'public']);
  });

  it('follows updates, deletes of excerpts and deletes of whole sources', async () => {
    const source = await makeSource({ contributorId, title: 'An account book' , sourceType: 'account' });
    const a = await makeExcerpt(source, { diplomatic: 'Paid for a consort of flutes', status: 'draft' });
    const b = await makeExcerpt(source, { diplomatic: 'Paid for mending the bass', status: 'draft' });
    const other = await makeSource({ contributorId, title: 'A letter' , sourceType: 'letter' });
    await makeExcerpt(other, { diplomatic: 'I send you the voice flute', status: 'draft' });
    await syncSearch();

    await editExcerpt(a, { diplomatic: 'Paid for a chest of recorders', mentions: [{ term: 'recorders', sizeSlug: 'tenor' }] });
    await deleteExcerpt(b);
    await deleteSource(other);
    await syncSearch();
    await expectIndexEqualsDatabase();
    const doc = (await indexedDocuments()).get(a.publicId)!;
    expect(doc.diplomatic).toBe('Paid for a chest of recorders');
    expect(doc.sizes).toEqual(['tenor']);
  });

  it('keeps the last approved version public while a newer edit waits for review', async () => {
    const source = await makeSource({ contributorId });
    const excerpt = await makeExcerpt(source, { diplomatic: 'The approved wording of the passage' });
    await editExcerpt(excerpt, { diplomatic: 'An unreviewed rewording' });
    await syncSearch();
    const doc = (await indexedDocuments()).get(excerpt.publicId)!;
    expect(doc).toMatchObject({ diplomatic: 'The approved wording of the passage', visibility: 'public', status: 'approved' });
    await expectIndexEqualsDatabase();
  });

  it('keeps writes working through a search outage and catches up afterwards', async () => {
    const source = await makeSource({ contributorId, title: 'Written while search was down' });
    await syncSearch();
    await searchGoesDown();

    const excerpt = await makeExcerpt(source, { diplomatic: 'Written while the search service was away', status: 'draft' });
    await editExcerpt(excerpt, { diplomatic: 'Edited while the search service was away' });
    const failed = await drainOnce();
    expect(failed.failed).toBeGreaterThan(0);
    expect(failed.error).toBeTruthy();
    const rows = await SearchOutbox.findAll();
    expect(rows.length).toBe(failed.failed);
    for (const row of rows) {
      expect(row.attempts).toBe(1);
      expect(row.lastError).toBeTruthy();
      expect(row.availableAt.getTime()).toBeGreaterThan(Date.now());
    }
    // Backed off: a second drain right away leaves the rows alone.
    expect((await drainOnce()).synced + (await drainOnce()).failed).toBe(0);

    // An outage older than a minute shows in health.
    await SearchOutbox.update({ createdAt: new Date(Date.now() - 120_000) }, { where: {} });
    searchComesBack();
    const health = await (await anonymous()).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body).toEqual({ status: 'degraded', db: 'ok', search: 'degraded' });

    await SearchOutbox.update({ availableAt: new Date(Date.now() - 1000) }, { where: {} });
    await syncSearch();
    await expectIndexEqualsDatabase();
    expect((await indexedDocuments()).get(excerpt.publicId)?.diplomatic).toBe('Edited while the search service was away');
    const healed = await (await anonymous()).get('/api/health');
    expect(healed.body.search).toBe('ok');
  });

  it('re-indexes from the database, removing documents the database does not have', async () => {
    const source = await makeSource({ contributorId });
    const kept = await makeExcerpt(source, { diplomatic: 'Kept through the re-index' });
    await syncSearch();
    const client = getSearchClient()!;
    const index = client.index(excerptsUid());
    await waitForTask(client, (await index.deleteDocument(kept.publicId)).taskUid, 'test delete');
    await waitForTask(client, (await index.addDocuments([{ id: 'EGHOST01', excerptId: 'EGHOST01', visibility: 'public' }])).taskUid, 'test add');

    const progress: number[] = [];
    const result = await reindexAll({ batchSize: 2, onProgress: (p) => progress.push(p.done) });
    expect(result.deleted).toBe(1);
    expect(progress.at(-1)).toBe(result.total);
    await expectIndexEqualsDatabase();
  });
});
