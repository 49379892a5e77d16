/**
 * The search service alone, without MariaDB or the app: the benchmark corpus (same
 * seed and generator as `npm run bench`) turned into documents shaped like
 * search/documents.ts builds them, indexed in batches through HTTP while a probe
 * measures how long searches wait during indexing, then the five query kinds sent as
 * the app sends them (search/query.ts `searchExcerpts`, one multi-search per query).
 *   npx tsx tests/bench/service-profile.ts [size=100000] [batch=2000]
 * For profiling: node --cpu-prof --import tsx tests/bench/service-profile.ts 30000
 */
import { Meilisearch } from 'meilisearch';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import { searchQuerySchema } from '@shared/search/schema';
import { startSearchService } from '../../search/service/server';
import { Corpus, type ExcerptRow, type MentionRow, type PitchRow, type SourceRow } from './corpus';
import { KINDS, apiPath, makeQueries, percentiles } from './queries';

const SIZE = Number(process.argv[2] ?? 100_000);
const BATCH = Number(process.argv[3] ?? 2000);
Object.assign(process.env, { NODE_ENV: 'production', DATABASE_URL: 'mariadb://x:y@127.0.0.1:1/none', SESSION_SECRET: 'x'.repeat(64), SEARCH_INDEX_PREFIX: 'prof_' });
const { excerptsSettings, namesOfSize } = await import('../../search/settings');
const { searchExcerpts } = await import('../../search/query');
const { decadesOf } = await import('../../search/documents');
const { indexUid } = await import('../../search/client');

const year = (d: string | null) => (d ? Number.parseInt(d.slice(0, d.indexOf('-', 1)), 10) : null);
function doc(e: ExcerptRow, s: SourceRow, mentions: MentionRow[], pitch: PitchRow[]) {
  const sizes = [...new Set(mentions.map((m) => m.sizeSlug))];
  const ye = year(e.dateEarliest ?? s.dateEarliest), yl = year(e.dateEarliest ? e.dateLatest : s.dateLatest);
  const visible = e.status === 'approved' && s.status === 'approved';
  return {
    id: e.publicId, excerptId: e.publicId, rowId: e.id, sourceId: s.publicId, sourceRowId: s.id, sourceTitle: s.title, sourceType: s.sourceType,
    creators: (JSON.parse(s.creators) as { name: string }[]).map((c) => c.name), place: s.place, languages: JSON.parse(s.languages) as string[],
    locator: `fol. ${e.locatorValue}`, diplomatic: e.diplomatic, normalised: e.normalised, translation: e.translation, commentary: e.commentary,
    terms: [...new Set(mentions.map((m) => m.term))], sizes, sizeNames: sizes.flatMap(namesOfSize),
    families: [...new Set(sizes.map((x) => INSTRUMENT_SIZES.find((z) => z.slug === x)?.family).filter(Boolean))],
    aHz: [...new Set(pitch.map((p) => p.aHz))], yearEarliest: ye, yearLatest: yl, decades: decadesOf(ye, yl), dateLabel: e.dateLabel ?? s.dateLabel,
    status: visible ? 'approved' : e.status, visibility: visible ? 'public' : 'draft', contributorId: 1, ownerIds: [1],
  };
}

const corpus = new Corpus(0x57a11d);
const sources = Array.from({ length: Math.max(1, Math.round(SIZE / 20)) }, (_, i) => corpus.source(i + 1, 1));
const docs: ReturnType<typeof doc>[] = [];
const termSlugs = new Map<string, Set<string>>();
for (let id = 1; id <= SIZE; id++) {
  const source = sources[Math.floor(Math.pow(corpus.rand(), 1.6) * sources.length)];
  const made = corpus.excerpt(id, source);
  for (const m of made.mentions) termSlugs.set(m.term, (termSlugs.get(m.term) ?? new Set()).add(m.sizeSlug));
  docs.push(doc(made.excerpt, source, made.mentions, made.pitch));
}
// As computeSynonyms() does: each term (and size's other name) → the names of its one or two sizes.
for (const size of INSTRUMENT_SIZES) for (const n of size.otherNames) termSlugs.set(n, (termSlugs.get(n) ?? new Set()).add(size.slug));
const synonyms: Record<string, string[]> = {};
for (const [term, slugs] of termSlugs) if (slugs.size <= 2) synonyms[term] = [...slugs].map((x) => INSTRUMENT_SIZES.find((z) => z.slug === x)?.name ?? x);

const svc = await startSearchService({ masterKey: 'prof' });
const client = new Meilisearch({ host: svc.url, apiKey: 'prof', timeout: 120_000 });
const index = client.index(indexUid('excerpts'));
await client.createIndex(index.uid, { primaryKey: 'id' }).waitTask();
await index.updateSettings({ ...excerptsSettings(), synonyms }).waitTask();

// Indexing, with a probe search every 20 ms measuring how long a search waits.
const probe: number[] = [];
let indexing = true;
const probing = (async () => {
  while (indexing) {
    const t = performance.now();
    await index.search('flute', { limit: 1 });
    probe.push(performance.now() - t);
    await new Promise((r) => setTimeout(r, 20));
  }
})();
const t0 = performance.now();
for (let i = 0; i < docs.length; i += BATCH) {
  const task = await index.addDocuments(docs.slice(i, i + BATCH)).waitTask({ timeout: 300_000, interval: 25 });
  if (task.status !== 'succeeded') throw new Error(JSON.stringify(task.error));
}
const indexMs = performance.now() - t0;
indexing = false;
await probing;
const pr = percentiles(probe, []);
console.log(`indexed ${SIZE} docs in ${(indexMs / 1000).toFixed(1)} s (${Math.round(SIZE / (indexMs / 1000))} docs/s, batch ${BATCH}); probe search during indexing p50 ${pr.p50.toFixed(1)} / p95 ${pr.p95.toFixed(1)} / max ${Math.max(...probe).toFixed(0)} ms; rss ${Math.round(process.memoryUsage().rss / 2 ** 20)} MB`);

// PROFILE=file.cpuprofile: a CPU profile of the query phase only (open it in Chrome DevTools).
const { Session } = await import('node:inspector/promises');
const session = process.env.PROFILE ? new Session() : null;
if (session) { session.connect(); await session.post('Profiler.enable'); await session.post('Profiler.start'); }
const queries = makeQueries(corpus, 200);
for (const kind of KINDS) {
  const ms: number[] = [];
  const hits: number[] = [];
  for (const [i, b] of queries[kind].entries()) {
    const q = searchQuerySchema.parse(Object.fromEntries(new URLSearchParams(apiPath(b).split('?')[1])));
    const t = performance.now();
    const r = await searchExcerpts(client, q, null);
    if (i >= 10) { ms.push(performance.now() - t); hits.push(r.total); }
  }
  const l = percentiles(ms, hits);
  console.log(`${kind.padEnd(22)} p50 ${l.p50.toFixed(1).padStart(6)}  p95 ${l.p95.toFixed(1).padStart(6)}  p99 ${l.p99.toFixed(1).padStart(6)}  mean hits ${Math.round(l.meanHits)}`);
}
console.log(`rss ${Math.round(process.memoryUsage().rss / 2 ** 20)} MB`);
if (session) {
  const { profile } = await session.post('Profiler.stop');
  (await import('node:fs')).writeFileSync(process.env.PROFILE!, JSON.stringify(profile));
}
await svc.close();
process.exit(0);
