/**
 * Contract: keys, health/version, CORS, asynchronous tasks and index
 * creation, checked through the official `meilisearch` client and raw HTTP.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { Meilisearch } from 'meilisearch';
import { startHarness, stopHarness, raw, apiError, MASTER_KEY, type Harness } from './helpers';

let h: Harness;
beforeAll(async () => { h = await startHarness(); });
afterAll(async () => { await stopHarness(h); });

describe('security and keys', () => {
  it('GET /health answers without a key', async () => {
    // Meilisearch docs — Health: "Get health" returns {"status": "available"} and needs no API key
    const r = await raw(h, 'GET', '/health', undefined, {});
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ status: 'available' });
    expect(await new Meilisearch({ host: h.url }).health()).toEqual({ status: 'available' });
  });

  it('a missing Authorization header is 401 missing_authorization_header', async () => {
    // Meilisearch docs — Errors: missing_authorization_header; Security: protected instance requires a key
    const r = await raw(h, 'GET', '/indexes', undefined, {});
    expect(r.status).toBe(401);
    expect(r.body).toMatchObject({ code: 'missing_authorization_header', type: 'auth' });
    expect(r.body.link).toBe('https://docs.meilisearch.com/errors#missing_authorization_header');
  });

  it('a wrong key is 403 invalid_api_key, also through the client', async () => {
    // Meilisearch docs — Errors: invalid_api_key
    const r = await raw(h, 'GET', '/indexes', undefined, { Authorization: 'Bearer nope' });
    expect(r.status).toBe(403);
    expect(r.body).toMatchObject({ code: 'invalid_api_key', type: 'auth' });
    const e = await apiError(new Meilisearch({ host: h.url, apiKey: 'wrong' }).getIndexes());
    expect(e.code).toBe('invalid_api_key');
    expect(e.status).toBe(403);
  });

  it('the master key as Bearer token opens every route', async () => {
    // Meilisearch docs — Security and permissions: "Authorization: Bearer MASTER_KEY"
    const r = await raw(h, 'GET', '/indexes');
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ results: expect.any(Array), total: expect.any(Number) });
  });

  it('GET /version returns commitSha, commitDate and pkgVersion', async () => {
    // Meilisearch docs — Version: "Get version of Meilisearch"
    const v = await h.client.getVersion();
    expect(Object.keys(v).sort()).toEqual(['commitDate', 'commitSha', 'pkgVersion']);
    expect(typeof v.pkgVersion).toBe('string');
  });

  it('answers CORS preflights without a key', async () => {
    // Meilisearch docs — Configuration / CORS: browsers send OPTIONS preflights before authorised requests
    const res = await fetch(h.url + '/indexes/books/search', { method: 'OPTIONS', headers: { Origin: 'http://localhost:5173', 'Access-Control-Request-Method': 'POST', 'Access-Control-Request-Headers': 'authorization, content-type' } });
    expect(res.status).toBeLessThan(300);
    expect(res.headers.get('access-control-allow-origin')).toMatch(/localhost:5173|\*/);
    expect(res.headers.get('access-control-allow-methods')).toContain('POST');
    expect(res.headers.get('access-control-allow-headers')?.toLowerCase()).toContain('authorization');
  });
});

describe('tasks', () => {
  it('a write is answered 202 with a summarized task, then succeeds; uids count up', async () => {
    // Meilisearch docs — Asynchronous operations: summarized task object {taskUid, indexUid, status, type, enqueuedAt}
    const r = await raw(h, 'POST', '/indexes', { uid: 'tasks_a', primaryKey: 'id' });
    expect(r.status).toBe(202);
    expect(Object.keys(r.body).sort()).toEqual(['enqueuedAt', 'indexUid', 'status', 'taskUid', 'type']);
    expect(r.body).toMatchObject({ indexUid: 'tasks_a', status: 'enqueued', type: 'indexCreation' });
    expect(Number.isNaN(Date.parse(r.body.enqueuedAt))).toBe(false);
    const second = await h.client.createIndex('tasks_b');
    expect(second.taskUid).toBe(r.body.taskUid + 1);
    const t = await h.client.tasks.waitForTask(r.body.taskUid);
    expect(t.status).toBe('succeeded');
  });

  it('GET /tasks/:uid has every field of the task object', async () => {
    // Meilisearch docs — Tasks API: task object fields uid, batchUid, indexUid, status, type, canceledBy, details, error, duration, enqueuedAt, startedAt, finishedAt
    const t = await h.client.index('tasks_c').addDocuments([{ id: 1, title: 'Flute' }]).waitTask();
    const r = await raw(h, 'GET', `/tasks/${t.uid}`);
    expect(Object.keys(r.body).sort()).toEqual(['batchUid', 'canceledBy', 'details', 'duration', 'enqueuedAt', 'error', 'finishedAt', 'indexUid', 'startedAt', 'status', 'type', 'uid'].sort());
    expect(r.body).toMatchObject({ status: 'succeeded', type: 'documentAdditionOrUpdate', error: null, canceledBy: null, details: { receivedDocuments: 1, indexedDocuments: 1 } });
    // Meilisearch docs — Tasks API: duration is an ISO 8601 duration; dates are RFC 3339
    expect(r.body.duration).toMatch(/^PT\d+(\.\d+)?S$/);
    expect(Date.parse(r.body.finishedAt)).toBeGreaterThanOrEqual(Date.parse(r.body.startedAt));
    expect(typeof r.body.batchUid).toBe('number');
  });

  it('an unknown task uid is 404 task_not_found', async () => {
    // Meilisearch docs — Errors: task_not_found
    const e = await apiError(h.client.tasks.getTask(999_999));
    expect(e).toMatchObject({ code: 'task_not_found', type: 'invalid_request', status: 404 });
  });

  it('creating an existing index enqueues (202) a task that fails with index_already_exists; waitTask does not throw', async () => {
    // Meilisearch docs — Indexes: "Create an index"; Errors: index_already_exists; Asynchronous operations: failed tasks keep an error object
    await h.client.createIndex('dup').waitTask();
    const task = await h.client.createIndex('dup').waitTask();
    expect(task.status).toBe('failed');
    expect(task.error).toMatchObject({ code: 'index_already_exists', type: 'invalid_request', link: 'https://docs.meilisearch.com/errors#index_already_exists' });
    expect(task.error?.message).toContain('dup');
  });

  it('tasks run in enqueue order and a failed task changes nothing', async () => {
    // Meilisearch docs — Asynchronous operations: "tasks are processed in the order they were enqueued"; a failed task has no effect
    const index = h.client.index('order');
    const a = await index.addDocuments([{ id: 1, v: 'first' }]);
    const bad = await index.addDocuments([{ id: 'not valid!', v: 'x' }]);
    const b = await index.updateDocuments([{ id: 1, v: 'second' }]);
    const [ta, tbad, tb] = await h.client.tasks.waitForTasks([a, bad, b]);
    expect([ta.status, tbad.status, tb.status]).toEqual(['succeeded', 'failed', 'succeeded']);
    expect(Date.parse(tb.startedAt!)).toBeGreaterThanOrEqual(Date.parse(ta.finishedAt!));
    expect(tbad.error?.code).toBe('invalid_document_id');
    expect(await index.getDocument(1)).toEqual({ id: 1, v: 'second' });
    expect((await index.search('')).estimatedTotalHits).toBe(1);
  });
});

describe('indexes', () => {
  it('GET /indexes/:uid returns uid, primaryKey, createdAt, updatedAt', async () => {
    // Meilisearch docs — Indexes: index object
    await h.client.createIndex('books_meta', { primaryKey: 'isbn' }).waitTask();
    const r = await raw(h, 'GET', '/indexes/books_meta');
    expect(Object.keys(r.body).sort()).toEqual(['createdAt', 'primaryKey', 'uid', 'updatedAt']);
    expect(r.body).toMatchObject({ uid: 'books_meta', primaryKey: 'isbn' });
    const ix = await h.client.getIndex('books_meta');
    expect(ix.primaryKey).toBe('isbn');
  });

  it('an unknown index is 404 index_not_found for reads and searches', async () => {
    // Meilisearch docs — Errors: index_not_found
    expect(await apiError(h.client.getIndex('nowhere'))).toMatchObject({ code: 'index_not_found', status: 404 });
    expect(await apiError(h.client.index('nowhere').search('flute'))).toMatchObject({ code: 'index_not_found', status: 404 });
  });

  it('an invalid index uid is refused', async () => {
    // Meilisearch docs — Indexes: "uid ... alphanumeric characters, hyphens and underscores"; Errors: invalid_index_uid
    const r = await raw(h, 'POST', '/indexes', { uid: 'bad uid!' });
    expect(r.status).toBe(400);
    expect(r.body.code).toBe('invalid_index_uid');
  });
});

describe('request validation', () => {
  it('an unknown top-level search field is 400 bad_request', async () => {
    // Meilisearch docs — Errors: bad_request ("The request is invalid"); engine rejects unknown fields (deny_unknown_fields)
    await h.client.index('tasks_c').addDocuments([{ id: 2 }]).waitTask();
    const r = await raw(h, 'POST', '/indexes/tasks_c/search', { q: 'flute', notAParameter: 1 });
    expect(r.status).toBe(400);
    expect(r.body).toMatchObject({ code: 'bad_request', type: 'invalid_request' });
    expect(r.body.message).toContain('notAParameter');
  });

  it('an unknown settings field is 400 bad_request', async () => {
    // Meilisearch docs — Settings: the settings object; Errors: bad_request
    const r = await raw(h, 'PATCH', '/indexes/tasks_c/settings', { notASetting: [] });
    expect(r.status).toBe(400);
    expect(r.body.code).toBe('bad_request');
  });

  it('a wrongly typed search parameter gets its invalid_search_* code', async () => {
    // Meilisearch docs — Errors: invalid_search_limit
    const r = await raw(h, 'POST', '/indexes/tasks_c/search', { q: 'x', limit: 'ten' });
    expect(r.status).toBe(400);
    expect(r.body.code).toBe('invalid_search_limit');
  });
});
