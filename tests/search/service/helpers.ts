/** Shared setup for the local search service contract tests: a service on a random port with a master key and a temp dataDir. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Meilisearch, type Index } from 'meilisearch';
import { startSearchService, type SearchService } from '@search/service/server';

export const MASTER_KEY = 'test-master-key-0123456789';

export interface Harness { service: SearchService; client: Meilisearch; dataDir: string; url: string }

export async function startHarness(dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'windway-search-'))): Promise<Harness> {
  const service = await startSearchService({ port: 0, masterKey: MASTER_KEY, dataDir });
  return { service, client: new Meilisearch({ host: service.url, apiKey: MASTER_KEY }), dataDir, url: service.url };
}

export async function stopHarness(h: Harness | undefined, removeDir = true): Promise<void> {
  if (!h) return;
  await h.service.close();
  if (removeDir) fs.rmSync(h.dataDir, { recursive: true, force: true });
}

/** Raw request with the master key (for status codes and bodies the client hides). */
export async function raw(h: Harness, method: string, route: string, body?: unknown, headers: Record<string, string> = { Authorization: `Bearer ${MASTER_KEY}` }): Promise<{ status: number; body: any; headers: Headers }> {
  const res = await fetch(h.url + route, { method, headers: { 'Content-Type': 'application/json', ...headers }, body: body === undefined ? undefined : JSON.stringify(body) });
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : undefined, headers: res.headers };
}

/** Awaits a task and insists it succeeded (a failed task is returned, not thrown, by the client). */
export async function ok(p: { waitTask(): Promise<{ status: string; error: unknown }> }): Promise<void> {
  const t = await p.waitTask();
  if (t.status !== 'succeeded') throw new Error(`task ${t.status}: ${JSON.stringify(t.error)}`);
}

/** The error body a client call was rejected with (MeilisearchApiError.cause). */
export async function apiError(p: Promise<unknown>): Promise<{ code: string; type: string; message: string; link: string; status?: number }> {
  try { await p; } catch (e) {
    const err = e as { cause?: { code: string; type: string; message: string; link: string }; response?: Response };
    if (err.cause && typeof err.cause === 'object' && 'code' in err.cause) return { ...err.cause, status: err.response?.status };
    throw e;
  }
  throw new Error('expected the request to fail');
}

export const ids = (r: { hits: Record<string, unknown>[] }) => r.hits.map((h) => h.id);

/** A small woodwind corpus used across the search tests. */
export const SOURCES = [
  { id: 1, title: 'Principes de la flûte traversière', author: 'Hotteterre', year: 1707, genre: 'treatise', instruments: ['flute', 'recorder', 'oboe'], body: 'The first method for the transverse flute, with fingering tables and ornaments.' },
  { id: 2, title: 'Versuch einer Anweisung die Flöte traversière zu spielen', author: 'Quantz', year: 1752, genre: 'treatise', instruments: ['flute'], body: 'A comprehensive essay on playing the flute, on taste, tempo and the duties of an accompanist.' },
  { id: 3, title: 'Method for the hautboy', author: 'Anonymous', year: 1695, genre: 'method', instruments: ['oboe'], body: 'Short instructions for the hautboy and its reeds, printed in London.' },
  { id: 4, title: 'Letter on bassoon reeds', author: 'Ozi', year: 1787, genre: 'letter', instruments: ['bassoon'], body: 'Scraping and shaping reeds for the bassoon; the tip must be thin.' },
  { id: 5, title: 'Recorder fingering chart', author: 'Anonymous', year: null, genre: 'chart', instruments: [], body: 'A printed chart of recorder fingerings in the baroque style.' },
  { id: 6, title: 'Inventory of instruments', author: 'Court of Oderstadt', year: 1681, genre: 'inventory', instruments: ['flute', 'bassoon', 'shawm'], body: 'Instruments kept by the court: flutes, shawms and a bassoon.' },
  { id: 7, title: 'Clarinet tutor', author: 'Lefèvre', year: 1802, genre: 'method', instruments: ['clarinet'], body: 'The clarinet method adopted by the Paris Conservatoire.' },
  { id: 8, title: 'Oboe concerto review', author: "O'Neill", year: 1825, genre: 'review', body: 'A review of a concert in which the oboe soloist played with great taste.' },
];
export type Source = (typeof SOURCES)[number];

export async function seedSources(client: Meilisearch, uid: string, settings: Record<string, unknown> = {}): Promise<Index<Source>> {
  const index = client.index<Source>(uid);
  await ok(index.addDocuments(structuredClone(SOURCES)));
  await ok(index.updateSettings({ filterableAttributes: ['genre', 'year', 'instruments', 'author'], sortableAttributes: ['year', 'title'], searchableAttributes: ['title', 'author', 'body', 'instruments'], ...settings }));
  return index;
}
