/**
 * `npm run load`: autocannon against Windway on the fictional demo data, on loopback only.
 * 50 connections for 60 s (LOAD_SECONDS, LOAD_CONNECTIONS to change), a mix of search,
 * excerpt pages, citations and failed sign-ins; prints a Markdown table.
 * Target on this 2-core machine: no errors, no non-2xx other than the sign-ins' 401s, p99 < 500 ms.
 *
 * The mix: two kinds of search, the excerpt page, BibTeX and notes citations equally often, and
 * one request in LOAD_SIGN_IN_EVERY (default 21, about 5%) a failed sign-in. A sign-in costs
 * about 28 ms of CPU by design (argon2id at OWASP's minimum), ten times a read: at one request
 * in 11 the run measures mostly password hashing; readers sign in once a visit, if at all.
 *
 * For finding what is slow: LOAD_ONLY=<kind> runs one kind of request alone, LOAD_PATH=/api/…
 * one GET path, LOAD_PROFILE=1 writes a CPU profile of the app to .data/load-profiles.
 */
import autocannon from 'autocannon';
import { fork } from 'node:child_process';
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
await migrateToLatest(getSequelize());
const demoPassword = `load-${randomBytes(8).toString('hex')}`;
await seedDemo({ reader: demoPassword, contributor: demoPassword, editor: demoPassword, admin: demoPassword });
const app = await startAppProcess();

/**
 * The app runs as its own process, as `npm run serve` does in a deployment: in this one,
 * autocannon would share its event loop. LOAD_PROFILE=1 writes a V8 CPU profile of the
 * app to .data/load-profiles (open it in Chrome's DevTools).
 */
async function startAppProcess() {
  const profile = process.env.LOAD_PROFILE === '1' ? ['--cpu-prof', `--cpu-prof-dir=${resolve(dataRoot, 'load-profiles')}`] : [];
  const child = fork(resolve(import.meta.dirname, '../../server/cli/serve.ts'), [], {
    execArgv: ['--import', 'tsx', ...profile],
    env: { ...process.env, MIGRATE: '0' },
  });
  const url = await new Promise<string>((resolveUrl, reject) => {
    child.once('message', (message) => resolveUrl((message as { url: string }).url));
    child.once('exit', (code) => reject(new Error(`The app stopped while starting (exit code ${code}).`)));
  });
  return {
    url,
    async close() {
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    },
  };
}

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
  type Shape = Pick<autocannon.Request, 'method' | 'path' | 'headers' | 'body'>;
  const kinds: Record<string, () => Shape> = {
    'search-words': () => ({ method: 'GET', path: `/api/search?q=${encodeURIComponent(pick(words))}` }),
    'search-filters': () => ({ method: 'GET', path: `/api/search?size=voice-flute&aMax=420&to=1730` }),
    excerpt: () => ({ method: 'GET', path: `/api/excerpts/${pick(excerptIds)}` }),
    'cite-bibtex': () => ({ method: 'GET', path: `/api/excerpts/${pick(excerptIds)}/cite?format=bibtex` }),
    'cite-notes': () => ({ method: 'GET', path: `/api/excerpts/${pick(excerptIds)}/cite?format=text&style=notes` }),
    'sign-in': () => ({
      method: 'POST',
      path: '/api/auth/login',
      headers: { 'content-type': 'application/json', cookie, 'x-csrf-token': csrfToken },
      // A new address for each request built: one address tried often would meet the sign-in throttle (429).
      body: JSON.stringify({ email: `nobody-${n++}@load.invalid`, password: 'not the password' }),
    }),
  };
  // LOAD_PATH=/api/… measures one GET path alone (profiling).
  if (process.env.LOAD_PATH) kinds.path = () => ({ method: 'GET', path: process.env.LOAD_PATH });
  const only = process.env.LOAD_PATH ? 'path' : process.env.LOAD_ONLY;
  if (only && !kinds[only]) throw new Error(`LOAD_ONLY must be one of: ${Object.keys(kinds).join(', ')}.`);

  // The mix: the five reads equally often, and one request in LOAD_SIGN_IN_EVERY a (failing) sign-in.
  const signInEvery = Number(process.env.LOAD_SIGN_IN_EVERY ?? 21);
  const reads = ['search-words', 'search-filters', 'excerpt', 'cite-bibtex', 'cite-notes'];
  let seed = 0x5eed;
  const random = () => {
    // mulberry32: a fixed seed, so every run sends the same requests.
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const drawKind = () => only ?? (random() * signInEvery < 1 ? 'sign-in' : reads[Math.floor(random() * reads.length)]);
  // Each connection gets its own sequence, drawn at random as independent visitors arrive (in one
  // shared rotation, connections bunch up behind the slow sign-ins). Requests are built before
  // the run, so autocannon spends its CPU on sending rather than on building them. A connection
  // sends about 6 a second and starts its list again at the end: at two per second of the run,
  // each sign-in address comes round a few times at most, well under the throttle's 10.
  const perConnection = Math.max(200, seconds * 2);
  const sequences = Array.from({ length: connections }, () => Array.from({ length: perConnection }, () => kinds[drawKind()]()));

  // Warm-up, not measured: the JIT, the database pool and citeproc's style engines get going,
  // with as many requests at once as the run has connections.
  const warmUp = (only ? [only] : Object.keys(kinds).filter((k) => k !== 'path')).flatMap((kind) => Array.from({ length: 20 }, () => kinds[kind]()));
  for (let i = 0; i < warmUp.length; i += connections) {
    await Promise.all(
      warmUp.slice(i, i + connections).map(async ({ method, path, headers, body }) => {
        await (await fetch(`${app.url}${path}`, { method, headers: headers as Record<string, string>, body: body as string | undefined })).text();
      }),
    );
  }

  const statuses: Record<string, number> = {};
  const readTimes: number[] = [];
  const signInTimes: number[] = [];
  const percentile = (times: number[], p: number) => {
    const sorted = [...times].sort((a, b) => a - b);
    return sorted.length ? Math.round(sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]) : 0;
  };
  let clientIndex = 0;
  const instance = autocannon({
    url: app.url,
    connections,
    duration: seconds,
    requests: sequences[0],
    setupClient: (client) => {
      client.setRequests(sequences[clientIndex++ % connections]);
      client.on('response', (status: number, _bytes: number, ms: number) => {
        statuses[status] = (statuses[status] ?? 0) + 1;
        // A 401 is a sign-in here: the reads are all public.
        (status === 401 ? signInTimes : readTimes).push(ms);
      });
    },
  });
  const result = await instance;
  const unexpected = Object.entries(statuses).filter(([status]) => !status.startsWith('2') && status !== '401');
  console.log('\n| measure | value |\n|---|---|');
  console.log(`| duration, connections | ${seconds} s, ${connections}${only ? ` (${only} only)` : `, 1 request in ${signInEvery} a sign-in`} |`);
  console.log(`| requests | ${result.requests.total} (${result.requests.average.toFixed(0)} req/s) |`);
  console.log(`| latency p50 / p99 | ${result.latency.p50} ms / ${result.latency.p99} ms |`);
  console.log(`| latency p90 / p97.5 / max | ${result.latency.p90} ms / ${result.latency.p97_5} ms / ${result.latency.max} ms |`);
  console.log(`| reads: p50 / p99 | ${percentile(readTimes, 50)} ms / ${percentile(readTimes, 99)} ms |`);
  console.log(`| sign-ins: p50 / p99 | ${percentile(signInTimes, 50)} ms / ${percentile(signInTimes, 99)} ms |`);
  console.log(`| statuses | ${Object.entries(statuses).map(([s, c]) => `${s}: ${c}`).join(', ')} |`);
  console.log(`| errors / timeouts | ${result.errors} / ${result.timeouts} |`);
  const ok = result.errors === 0 && result.timeouts === 0 && unexpected.length === 0 && result.latency.p99 < 500;
  console.log(`| target (no errors, only 2xx and 401, p99 < 500 ms) | ${ok ? 'met' : 'MISSED'} |`);
  process.exitCode = ok ? 0 : 1;
} finally {
  await app.close();
  await (await import('../../server/db')).closeSequelize();
  await search.stop();
  await db.stop();
  rmSync(dir, { recursive: true, force: true });
}
