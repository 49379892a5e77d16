/**
 * `npm run load`: autocannon against Windway on the fictional demo data, on loopback only.
 * 50 connections for 60 s (LOAD_SECONDS, LOAD_CONNECTIONS to change), a mix of search,
 * excerpt pages, citations and failed sign-ins; prints a Markdown table.
 * Target on this 2-core machine: no errors, no non-2xx other than the sign-ins' 401s, p99 < 500 ms.
 */
import autocannon from 'autocannon';
import { mkdtempSync, rmSync, mkdirSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { resolve } from 'node:path';
import { startPrivateMariaDb } from '../../server/cli/mariadb';
import { startSearchProcess } from '../../server/cli/search-process';
import { ensureSystemPackages } from '../../server/cli/system-packages';
import { dataRoot } from '../../server/cli/local-env';

const seconds = Number(process.env.LOAD_SECONDS ?? 60);
const connections = Number(process.env.LOAD_CONNECTIONS ?? 50);

ensureSystemPackages(['mariadb-server', 'citation-style-language-styles']);
mkdirSync(dataRoot, { recursive: true });
const dir = mkdtempSync(resolve(dataRoot, 'load-'));
const password = randomBytes(12).toString('hex');
const db = await startPrivateMariaDb({ dir: resolve(dir, 'mariadb'), database: 'windway_load', password });
const searchKey = randomBytes(16).toString('hex');
const search = await startSearchProcess({ dataDir: resolve(dir, 'search'), masterKey: searchKey });
Object.assign(process.env, {
  NODE_ENV: 'production',
  DATABASE_URL: db.url,
  MEILI_HOST: search.url,
  MEILI_KEY: searchKey,
  SESSION_SECRET: randomBytes(48).toString('hex'),
  STORAGE_DIR: resolve(dir, 'files'),
  PORT: '0',
  DEMO: '1',
});

const { getSequelize } = await import('../../server/db');
const { migrateToLatest } = await import('../../server/migrator');
const { seedDemo } = await import('../../server/seeders/demo');
const { startWindway } = await import('../../server/index');
await migrateToLatest(getSequelize());
const demoPassword = `load-${randomBytes(8).toString('hex')}`;
await seedDemo({ reader: demoPassword, contributor: demoPassword, editor: demoPassword, admin: demoPassword });
const app = await startWindway({ migrate: false });

try {
  // Measure the steady state: the demo facsimiles' text extraction (background CPU work) finishes first.
  const { Facsimile } = await import('../../server/models');
  const { Op } = await import('sequelize');
  for (let i = 0; i < 600 && (await Facsimile.count({ where: { extractionStatus: { [Op.in]: ['pending', 'running'] } } })) > 0; i += 1) {
    await new Promise((r) => setTimeout(r, 500));
  }
  // Wait until the outbox has indexed the demo excerpts, so searches hit real documents.
  const { drainOnce } = await import('../../search/outbox-worker');
  for (let i = 0; i < 50 && (await drainOnce()).synced > 0; i += 1);
  const hits = (await (await fetch(`${app.url}/api/search?perPage=50`)).json()) as { hits: { excerptId: string }[] };
  const excerptIds = hits.hits.map((h) => h.excerptId);
  if (excerptIds.length === 0) throw new Error('The demo data has no searchable excerpts; the load test needs them.');

  // One session for the sign-in requests: its CSRF token lets the failed sign-ins reach the password check.
  const me = await fetch(`${app.url}/api/auth/me`);
  const cookie = (me.headers.get('set-cookie') ?? '').split(';')[0];
  const { csrfToken } = (await me.json()) as { csrfToken: string };

  const words = ['flute', 'fluyt', 'Blockflöte', 'pitch', 'chamber', 'ton', 'recorder', 'voice', 'basse', 'douce'];
  let n = 0;
  const pick = <T,>(list: T[]) => list[n++ % list.length];
  const requests: autocannon.Request[] = [
    { method: 'GET', setupRequest: (r) => ({ ...r, path: `/api/search?q=${encodeURIComponent(pick(words))}` }) },
    { method: 'GET', setupRequest: (r) => ({ ...r, path: `/api/search?size=voice-flute&aMax=420&to=1730` }) },
    { method: 'GET', setupRequest: (r) => ({ ...r, path: `/api/excerpts/${pick(excerptIds)}` }) },
    { method: 'GET', setupRequest: (r) => ({ ...r, path: `/api/excerpts/${pick(excerptIds)}/cite?format=bibtex` }) },
    { method: 'GET', setupRequest: (r) => ({ ...r, path: `/api/excerpts/${pick(excerptIds)}/cite?format=text&style=notes` }) },
  ];
  const signIn: autocannon.Request = {
    method: 'POST',
    path: '/api/auth/login',
    headers: { 'content-type': 'application/json', cookie, 'x-csrf-token': csrfToken },
    setupRequest: (r) => ({ ...r, body: JSON.stringify({ email: `nobody-${n++}@load.invalid`, password: 'not the password' }) }),
  };

  const statuses: Record<string, number> = {};
  const instance = autocannon({
    url: app.url,
    connections,
    duration: seconds,
    // Every tenth request is a (failing) sign-in; the rest are reads.
    requests: [...requests, ...requests, signIn],
    setupClient: (client) => {
      client.on('response', (status: number) => {
        statuses[status] = (statuses[status] ?? 0) + 1;
      });
    },
  });
  const result = await instance;
  const unexpected = Object.entries(statuses).filter(([status]) => !status.startsWith('2') && status !== '401');
  console.log('\n| measure | value |\n|---|---|');
  console.log(`| duration, connections | ${seconds} s, ${connections} |`);
  console.log(`| requests | ${result.requests.total} (${result.requests.average.toFixed(0)} req/s) |`);
  console.log(`| latency p50 / p99 | ${result.latency.p50} ms / ${result.latency.p99} ms |`);
  console.log(`| statuses | ${Object.entries(statuses).map(([s, c]) => `${s}: ${c}`).join(', ')} |`);
  console.log(`| errors / timeouts | ${result.errors} / ${result.timeouts} |`);
  const ok = result.errors === 0 && result.timeouts === 0 && unexpected.length === 0 && result.latency.p99 < 500;
  console.log(`| target (no errors, only 2xx and 401, p99 < 500 ms) | ${ok ? 'met' : 'MISSED'} |`);
  process.exitCode = ok ? 0 : 1;
} finally {
  await app.close();
  await search.stop();
  await db.stop();
  rmSync(dir, { recursive: true, force: true });
}
