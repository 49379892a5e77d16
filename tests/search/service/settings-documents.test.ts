/**
 * Contract: settings (defaults, partial update, null reset, sub-routes) and
 * documents (add/replace vs update, deletes, primary key inference, ids).
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import type { Settings } from 'meilisearch';
import { startHarness, stopHarness, raw, apiError, ok, ids, type Harness } from './helpers';

let h: Harness;
beforeAll(async () => { h = await startHarness(); });
afterAll(async () => { await stopHarness(h); });

describe('settings', () => {
  it('a new index has the documented default settings', async () => {
    // Meilisearch docs — Settings: "Settings object" default values
    await h.client.createIndex('defaults').waitTask();
    const s = await h.client.index('defaults').getSettings();
    expect(s.displayedAttributes).toEqual(['*']);
    expect(s.searchableAttributes).toEqual(['*']);
    expect(s.filterableAttributes).toEqual([]);
    expect(s.sortableAttributes).toEqual([]);
    expect(s.synonyms).toEqual({});
    expect(s.stopWords).toEqual([]);
    expect(s.typoTolerance).toMatchObject({ enabled: true, minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 }, disableOnWords: [], disableOnAttributes: [] });
    expect(s.faceting).toMatchObject({ maxValuesPerFacet: 100 });
    expect(s.pagination).toEqual({ maxTotalHits: 1000 });
  });

  it('PATCH changes only the fields sent, and null resets one field', async () => {
    // Meilisearch docs — Settings: "Update settings ... If the provided value is null, the setting is reset to its default"
    const index = h.client.index('patching');
    const task = await index.updateSettings({ filterableAttributes: ['genre'], stopWords: ['the'], pagination: { maxTotalHits: 50 } }).waitTask();
    // Meilisearch docs — Asynchronous operations: settingsUpdate task, created index if missing
    expect(task).toMatchObject({ status: 'succeeded', type: 'settingsUpdate', indexUid: 'patching' });
    await ok(index.updateSettings({ sortableAttributes: ['year'] }));
    let s = await index.getSettings();
    expect(s.filterableAttributes).toEqual(['genre']);
    expect(s.sortableAttributes).toEqual(['year']);
    expect(s.stopWords).toEqual(['the']);
    // the client's types omit null for objects like pagination, though the API accepts it
    await ok(index.updateSettings({ stopWords: null, pagination: null } as unknown as Settings));
    s = await index.getSettings();
    expect(s.stopWords).toEqual([]);
    expect(s.pagination).toEqual({ maxTotalHits: 1000 });
    expect(s.filterableAttributes).toEqual(['genre']);
  });

  it('typoTolerance and faceting are merged field by field', async () => {
    // Meilisearch docs — Settings: typo tolerance object; "Update typo tolerance settings" (partial update)
    const index = h.client.index('patching');
    await ok(index.updateSettings({ typoTolerance: { minWordSizeForTypos: { oneTypo: 4 } } }));
    await ok(index.updateSettings({ typoTolerance: { disableOnWords: ['Flûte'] }, faceting: { maxValuesPerFacet: 3 } }));
    const s = await index.getSettings();
    expect(s.typoTolerance).toMatchObject({ enabled: true, minWordSizeForTypos: { oneTypo: 4, twoTypos: 9 }, disableOnWords: ['Flûte'] });
    expect(s.faceting?.maxValuesPerFacet).toBe(3);
  });

  it('settings sub-routes read and reset one setting', async () => {
    // Meilisearch docs — Settings: "Get filterable attributes", "Reset filterable attributes"
    const index = h.client.index('patching');
    expect(await index.getFilterableAttributes()).toEqual(['genre']);
    await ok(index.resetFilterableAttributes());
    expect(await index.getFilterableAttributes()).toEqual([]);
    await ok(index.updateSynonyms({ hautbois: ['oboe'] }));
    expect(await index.getSynonyms()).toEqual({ hautbois: ['oboe'] });
  });

  it('an invalid setting value is rejected with invalid_settings_*', async () => {
    // Meilisearch docs — Errors: invalid_settings_filterable_attributes
    const r = await raw(h, 'PATCH', '/indexes/patching/settings', { filterableAttributes: 'genre' });
    expect(r.status).toBe(400);
    expect(r.body.code).toBe('invalid_settings_filterable_attributes');
  });
});

describe('documents', () => {
  it('POST replaces whole documents; PUT updates only the fields sent', async () => {
    // Meilisearch docs — Documents: "Add or replace documents" vs "Add or update documents"
    const index = h.client.index('docs');
    await ok(index.addDocuments([{ id: 1, title: 'Flute method', year: 1707 }]));
    await ok(index.updateDocuments([{ id: 1, year: 1710 }]));
    expect(await index.getDocument(1)).toEqual({ id: 1, title: 'Flute method', year: 1710 });
    await ok(index.addDocuments([{ id: 1, title: 'Oboe method' }]));
    expect(await index.getDocument(1)).toEqual({ id: 1, title: 'Oboe method' });
    expect(ids(await index.search('flute'))).toEqual([]);
    expect(ids(await index.search('oboe'))).toEqual([1]);
  });

  it('addition task details count received and indexed documents', async () => {
    // Meilisearch docs — Tasks API: documentAdditionOrUpdate details {receivedDocuments, indexedDocuments}
    const t = await h.client.index('docs').addDocuments([{ id: 2, title: 'Bassoon' }, { id: 3, title: 'Shawm' }]).waitTask();
    expect(t.details).toMatchObject({ receivedDocuments: 2, indexedDocuments: 2 });
  });

  it('infers the primary key from the single field ending in "id"', async () => {
    // Meilisearch docs — Primary key: "Meilisearch guesses your primary key ... attribute ending with id"
    await ok(h.client.index('infer').addDocuments([{ sourceId: 'a-1', title: 'x' }]));
    expect((await h.client.getIndex('infer')).primaryKey).toBe('sourceId');
  });

  it('uses the primaryKey query parameter when given', async () => {
    // Meilisearch docs — Documents: "primaryKey" query parameter of add documents
    await ok(h.client.index('pk_param').addDocuments([{ isbn: 'x1', uid: 'u', title: 'x' }], { primaryKey: 'isbn' }));
    expect((await h.client.getIndex('pk_param')).primaryKey).toBe('isbn');
  });

  it('fails the task when no field can be the primary key', async () => {
    // Meilisearch docs — Errors: index_primary_key_no_candidate_found
    const t = await h.client.index('no_pk').addDocuments([{ title: 'x' }]).waitTask();
    expect(t.status).toBe('failed');
    expect(t.error?.code).toBe('index_primary_key_no_candidate_found');
  });

  it('fails the task with invalid_document_id for a bad id and indexes nothing from that batch', async () => {
    // Meilisearch docs — Primary key: document id format "integer or string ... a-z A-Z 0-9, - and _ ... 511 bytes"; Errors: invalid_document_id
    const index = h.client.index('bad_ids');
    await ok(index.addDocuments([{ id: 'ok_1', t: 'a' }]));
    for (const bad of ['has space', 'é', 'x'.repeat(512), 1.5]) {
      const t = await index.addDocuments([{ id: 'ok_2', t: 'b' }, { id: bad, t: 'c' }]).waitTask();
      expect(t.status).toBe('failed');
      expect(t.error?.code).toBe('invalid_document_id');
    }
    expect((await index.search(null)).estimatedTotalHits).toBe(1);
  });

  it('deletes one document, a batch, and all documents (settings kept)', async () => {
    // Meilisearch docs — Documents: "Delete one document", "Delete documents by batch", "Delete all documents"
    const index = h.client.index('deleting');
    await ok(index.addDocuments([1, 2, 3, 4, 5].map((id) => ({ id, title: `Source ${id}` }))));
    await ok(index.updateSettings({ filterableAttributes: ['title'] }));
    let t = await index.deleteDocument(1).waitTask();
    expect(t).toMatchObject({ status: 'succeeded', type: 'documentDeletion' });
    t = await index.deleteDocument(99).waitTask();
    expect(t.status).toBe('succeeded');
    t = await index.deleteDocuments([2, 3]).waitTask();
    expect(t.details).toMatchObject({ providedIds: 2, deletedDocuments: 2 });
    expect(ids(await index.search(null))).toEqual([4, 5]);
    t = await index.deleteAllDocuments().waitTask();
    expect(t.details).toMatchObject({ deletedDocuments: 2 });
    expect((await index.search(null)).estimatedTotalHits).toBe(0);
    expect(await index.getFilterableAttributes()).toEqual(['title']);
  });

  it('GET of a missing document is 404 document_not_found', async () => {
    // Meilisearch docs — Errors: document_not_found
    expect(await apiError(h.client.index('docs').getDocument(404))).toMatchObject({ code: 'document_not_found', status: 404 });
  });

  it('displayedAttributes limits what documents and hits show', async () => {
    // Meilisearch docs — Displayed attributes: "attributes ... not in the list are not returned"
    const index = h.client.index('docs');
    await ok(index.updateSettings({ displayedAttributes: ['id', 'title'] }));
    await ok(index.addDocuments([{ id: 10, title: 'Clarinet', secret: 'hidden' }]));
    const r = await index.search('clarinet');
    expect(r.hits[0]).toEqual({ id: 10, title: 'Clarinet' });
    const r2 = await index.search('clarinet', { attributesToRetrieve: ['title', 'secret'] });
    expect(r2.hits[0]).toEqual({ title: 'Clarinet' });
  });
});
