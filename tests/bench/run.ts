/**
 * `npm run bench` (BENCH_SIZE=10000 for a quick run): a private MariaDB and the local
 * search service in a temp dir under .data/, a fictional corpus from a fixed seed,
 * bulk-loaded, re-indexed through search/indexer.ts, then five query kinds through
 * the real `GET /api/search` (the app in-process on a loopback port), the same
 * questions against MariaDB FULLTEXT and LIKE, and a Markdown table. Not a test.
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:http';
import { randomBytes } from 'node:crypto';
import { resolve } from 'node:path';
import { startPrivateMariaDb } from '@server/cli/mariadb';
import { startSearchProcess } from '@server/cli/search-process';
import { dataRoot } from '@server/cli/local-env';
import { Corpus } from './corpus';
import { loadCorpus } from './load';
import { KINDS, makeQueries, runApi, runSql, type Kind, type Latency } from './queries';

const SIZE = Number(process.env.BENCH_SIZE ?? 100_000);
const PER_KIND = Number(process.env.BENCH_QUERIES ?? 200);
const SQL_PER_KIND = Number(process.env.BENCH_SQL_QUERIES ?? 50);
const LIKE_PER_KIND = Number(process.env.BENCH_LIKE_QUERIES ?? (SIZE >= 50_000 ? 5 : 10));
const SEED = 0x57a11d;
const log = (line: string) => console.log(`[bench] ${line}`);
const s = (ms: number) => (ms / 1000).toFixed(1);
const f = (ms: number) => (ms < 10 ? ms.toFixed(1) : Math.round(ms).toString());

function memoryOf(pid: number | undefined): { rssMb: number; peakMb: number } {
  if (!pid) return { rssMb: NaN, peakMb: NaN };
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = (key: string) => Number(new RegExp(`${key}:\\s+(\\d+)`).exec(status)?.[1] ?? NaN);
  return { rssMb: kb('VmRSS') / 1024, peakMb: kb('VmHWM') / 1024 };
}

async function main() {
  mkdirSync(dataRoot, { recursive: true });
  const dir = mkdtempSync(resolve(dataRoot, 'bench-'));
  const stops: (() => Promise<void>)[] = [async () => rmSync(dir, { recursive: true, force: true })];
  const stopAll = async () => {
    for (const stop of stops.splice(0)) await stop().catch((error) => console.error(error));
  };
  for (const signal of ['SIGINT', 'SIGTERM'] as const) process.once(signal, () => void stopAll().then(() => process.exit(130)));
  try {
    const password = randomBytes(12).toString('hex');
    const db = await startPrivateMariaDb({ dir: resolve(dir, 'mariadb'), database: 'windway_bench', password });
    stops.unshift(() => db.stop());
    const key = randomBytes(16).toString('hex');
    const search = await startSearchProcess({ dataDir: resolve(dir, 'search'), masterKey: key });
    stops.unshift(() => search.stop());
    Object.assign(process.env, {
      NODE_ENV: 'production', DATABASE_URL: db.url, MEILI_HOST: search.url, MEILI_KEY: key, SEARCH_INDEX_PREFIX: 'bench_',
      SESSION_SECRET: randomBytes(48).toString('hex'), STORAGE_DIR: resolve(dir, 'files'), HOST: '127.0.0.1', PORT: '0',
    });
    log(`MariaDB and the search service (pid ${search.pid}) are up in ${dir}`);

    const { getSequelize, closeSequelize } = await import('@server/db');
    stops.unshift(() => closeSequelize());
    const { migrateToLatest } = await import('@server/migrator');
    const sequelize = getSequelize();
    await migrateToLatest(sequelize);
    const { User } = await import('@server/models');
    const user = await User.create({ email: 'bench@example.test', displayName: 'Bench contributor', passwordHash: 'x', role: 'contributor', emailVerifiedAt: new Date() });

    const corpus = new Corpus(SEED);
    const load = await loadCorpus(sequelize, corpus, SIZE, user.id, (l) => SIZE >= 50_000 && log(l));
    log(`corpus: ${load.sources} sources, ${load.excerpts} excerpts (${load.distinctTexts} distinct texts), ${load.mentions} mentions, ${load.pitchTags} pitch tags; generated in ${s(load.generateMs)} s, inserted in ${s(load.insertMs)} s`);
    if (load.distinctTexts < load.excerpts * 0.999) throw new Error(`The corpus repeats itself: ${load.distinctTexts} distinct texts in ${load.excerpts}`);

    const { reindexAll } = await import('@search/indexer');
    let lastLog = 0;
    const reindex = await reindexAll({
      onProgress: (p) => {
        if (Date.now() - lastLog < 5000 && p.done < p.total) return;
        lastLog = Date.now();
        log(`re-index ${p.done}/${p.total}, ${Math.round(p.docsPerSecond)} docs/s`);
      },
    });
    log(`re-index: ${reindex.done} docs in ${s(reindex.elapsedMs)} s (${Math.round(reindex.docsPerSecond)} docs/s; building documents ${s(reindex.buildMs)} s)`);
    const memory = memoryOf(search.pid);

    const { createApp } = await import('@server/app');
    const server = createServer(createApp());
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
    stops.unshift(() => new Promise((r) => { server.closeAllConnections(); server.close(() => r()); }));
    const address = server.address();
    const baseUrl = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}`;

    const queries = makeQueries(corpus, PER_KIND);
    const api = {} as Record<Kind, Latency>;
    for (const kind of KINDS) {
      api[kind] = await runApi(baseUrl, queries[kind]);
      log(`API ${kind}: p50 ${f(api[kind].p50)} ms, p95 ${f(api[kind].p95)} ms, p99 ${f(api[kind].p99)} ms; app→search round trip p50 ${f(api[kind].inner!.p50)} / p95 ${f(api[kind].inner!.p95)} ms (mean ${Math.round(api[kind].meanHits)} hits)`);
    }
    const memoryAfter = memoryOf(search.pid);

    const t = performance.now();
    await sequelize.query('ALTER TABLE excerpts ADD FULLTEXT INDEX bench_fulltext (diplomatic, normalised, translation, commentary)');
    const fulltextBuildMs = performance.now() - t;
    log(`FULLTEXT index built in ${s(fulltextBuildMs)} s (benchmark database only)`);
    const fulltext = {} as Record<Kind, Latency>;
    const like = {} as Record<Kind, Latency>;
    for (const kind of KINDS) {
      fulltext[kind] = await runSql(sequelize, queries[kind].slice(0, SQL_PER_KIND), 'fulltext');
      like[kind] = await runSql(sequelize, queries[kind].slice(0, LIKE_PER_KIND), 'like', 1);
      log(`SQL ${kind}: FULLTEXT p95 ${f(fulltext[kind].p95)} ms, LIKE p95 ${f(like[kind].p95)} ms`);
    }

    const lines = [
      `### Windway search benchmark — ${SIZE.toLocaleString('en')} excerpts over ${load.sources.toLocaleString('en')} sources (seed ${SEED})`,
      '',
      `Re-index into the local search service: **${s(reindex.elapsedMs)} s**, ${Math.round(reindex.docsPerSecond).toLocaleString('en')} docs/s (target < 120 s). ` +
        `Search service RSS after indexing ${Math.round(memory.rssMb)} MB, after queries ${Math.round(memoryAfter.rssMb)} MB (peak ${Math.round(memoryAfter.peakMb)} MB). ` +
        `MariaDB FULLTEXT index build ${s(fulltextBuildMs)} s.`,
      '',
      '| query kind | API p50 | API p95 | API p99 | of which app→search p50 / p95 | FULLTEXT p50 / p95 | LIKE p50 / p95 | p95 ratio FULLTEXT ÷ API | p95 ratio LIKE ÷ API | API p95 < 50 ms |',
      '|---|---|---|---|---|---|---|---|---|---|',
      ...KINDS.map((k) => {
        const slow = (l: Latency) => (l.timedOut ? ` (${l.timedOut} > 30 s)` : '');
        return `| ${k} | ${f(api[k].p50)} | ${f(api[k].p95)} | ${f(api[k].p99)} | ${f(api[k].inner!.p50)} / ${f(api[k].inner!.p95)} | ${f(fulltext[k].p50)} / ${f(fulltext[k].p95)}${slow(fulltext[k])} | ${f(like[k].p50)} / ${f(like[k].p95)}${slow(like[k])} | ${(fulltext[k].p95 / api[k].p95).toFixed(1)}× | ${(like[k].p95 / api[k].p95).toFixed(1)}× | ${api[k].p95 < 50 ? 'yes' : '**no**'} |`;
      }),
      '',
      `Milliseconds, one query at a time, warm; the load generator, the app, MariaDB and the search service share this machine. API: ${PER_KIND} queries per kind over HTTP through \`GET /api/search\` (anonymous: public filter, facet counts for sizes, families, types, languages, decades; disjunctive counts add a query per ticked group). ` +
        `SQL baselines (${SQL_PER_KIND} FULLTEXT / ${LIKE_PER_KIND} LIKE queries per kind): page of 20 + total + counts by size and by type, in one connection; InnoDB buffer pool 512 MiB.`,
    ];
    console.log(`\n${lines.join('\n')}\n`);
  } finally {
    await stopAll();
  }
}

main().then(
  () => process.exit(0),
  (error) => {
    console.error(error);
    process.exit(1);
  },
);
