/**
 * Performance self-check for the local search service (not a vitest test).
 *   npx tsx tests/search/service/perf-smoke.ts [docs=100000]
 * Builds a seeded synthetic archive-like corpus (Zipf vocabulary, topic words,
 * year/category fields) as in shared/handbook/search-engines.md, indexes it
 * through the HTTP API in batches of 5,000, and prints p50/p95 per query kind.
 */
import { Meilisearch } from 'meilisearch';
import { startSearchService } from '../../../search/service/server';

const N = Number(process.argv[2] ?? process.env.PERF_DOCS ?? 100_000);
const RUNS = 200;

/** mulberry32: 32-bit integer arithmetic via Math.imul, so no float precision loss. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const rand = prng(20240601);
const int = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));

const SYL = ['ba', 'ke', 'lo', 'mi', 'nu', 'ra', 'se', 'ti', 'vo', 'za', 'pe', 'do', 'gu', 'fi', 'ha', 'jo', 'ly', 'wen', 'tor', 'qua'];
function word(i: number): string {
  let s = '';
  let x = i + 400; // at least two syllables
  while (x > 0) { s += SYL[x % SYL.length]; x = Math.floor(x / SYL.length); }
  return s;
}
const V = 50_000;
const vocab = Array.from({ length: V }, (_, i) => word(i));
const cum = new Float64Array(V);
{ let s = 0; for (let k = 0; k < V; k++) { s += 1 / (k + 1); cum[k] = s; } }
function zipf(): string {
  const u = rand() * cum[V - 1];
  let lo = 100, hi = V - 1; // the 100 most frequent are dropped, as stop words would be
  while (lo < hi) { const m = (lo + hi) >> 1; if (cum[m] < u) lo = m + 1; else hi = m; }
  return vocab[lo];
}
const TOPICS = ['flute', 'oboe', 'pitch', 'reed', 'bassoon', 'traverso'];
const TOPIC_P = [0.37, 0.3, 0.25, 0.22, 0.2, 0.2];
const CATS = ['treatise', 'method', 'letter', 'inventory', 'patent', 'catalogue', 'review', 'diary', 'advert', 'score'];

function makeDoc(id: number) {
  const len = int(40, 250);
  const body: string[] = [];
  for (let i = 0; i < len; i++) body.push(zipf());
  TOPICS.forEach((t, i) => { if (rand() < TOPIC_P[i]) body[int(0, len - 1)] = t; });
  const title = Array.from({ length: int(3, 8) }, () => zipf()).join(' ');
  const year = int(1500, 1900);
  return { id, title, body: body.join(' '), category: CATS[int(0, CATS.length - 1)], year, decade: year - (year % 10) };
}

/** Two independent 32-bit FNV-1a style hashes: enough to count distinct documents without keeping them. */
function hash(s: string): string {
  let a = 0x811c9dc5, b = 0x01000193;
  for (let i = 0; i < s.length; i++) { const c = s.charCodeAt(i); a = Math.imul(a ^ c, 0x01000193); b = Math.imul(b ^ c, 0x5bd1e995) + 1; }
  return (a >>> 0).toString(36) + (b >>> 0).toString(36);
}

function pct(xs: number[], p: number): number { const s = [...xs].sort((a, b) => a - b); return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))]; }

const svc = await startSearchService({ masterKey: 'perf' });
const client = new Meilisearch({ host: svc.url, apiKey: 'perf' });
const index = client.index('perf');
await index.updateSettings({ searchableAttributes: ['title', 'body'], filterableAttributes: ['category', 'year', 'decade'], sortableAttributes: ['year'] }).waitTask();

const heap0 = process.memoryUsage().heapUsed;
// A probe search every 20 ms while indexing: how long searches wait behind a batch being indexed.
const probe: number[] = [];
let indexing = true;
const probing = (async () => {
  while (indexing) {
    const s = performance.now();
    await index.search('flute', { limit: 1 }).catch(() => null);
    probe.push(performance.now() - s);
    await new Promise((r) => setTimeout(r, 20));
  }
})();
const t0 = performance.now();
const seen = new Set<string>();
let genMs = 0;
for (let i = 0; i < N; i += 5000) {
  const g = performance.now();
  const docs = Array.from({ length: Math.min(5000, N - i) }, (_, j) => makeDoc(i + j));
  for (const d of docs) seen.add(hash(d.title + '|' + d.body));
  genMs += performance.now() - g;
  const task = await index.addDocuments(docs).waitTask({ timeout: 120_000, interval: 20 });
  if (task.status !== 'succeeded') throw new Error(JSON.stringify(task.error));
}
const indexMs = performance.now() - t0 - genMs;
indexing = false;
await probing;
global.gc?.();
const mem = process.memoryUsage();
console.log(`docs ${N} (distinct documents ${seen.size}); index ${(indexMs / 1000).toFixed(1)} s through HTTP; heap +${((mem.heapUsed - heap0) / 2 ** 20).toFixed(0)} MB, rss ${(mem.rss / 2 ** 20).toFixed(0)} MB`);
console.log(`search during indexing: p50 ${pct(probe, 50).toFixed(1)} ms, p95 ${pct(probe, 95).toFixed(1)} ms, max ${Math.max(...probe).toFixed(0)} ms (${probe.length} probes)`);

// Query words by document frequency band.
const rare = Array.from({ length: 50 }, (_, i) => vocab[20_000 + i * 500]);
const mid = Array.from({ length: 50 }, (_, i) => vocab[300 + i * 20]);
const pick = <T,>(xs: T[]) => xs[int(0, xs.length - 1)];
const typo = (w: string) => w.slice(0, 2) + w[3] + w[2] + w.slice(4);
type Q = { q: string | null; opts?: Record<string, unknown> };
const kinds: Record<string, () => Q> = {
  rare: () => ({ q: pick(rare) }),
  mid: () => ({ q: pick(mid) }),
  topic: () => ({ q: pick(TOPICS) }),
  'two words': () => ({ q: `${pick(TOPICS)} ${pick(mid)}` }),
  'typo (topic word)': () => ({ q: typo(pick(['traverso', 'bassoon', 'flutes'])) }),
  'prefix (3 letters)': () => ({ q: pick(mid).slice(0, 3) }),
  phrase: () => ({ q: `"${pick(mid)} ${pick(TOPICS)}"` }),
  filter: () => { const y = int(1500, 1850); return { q: pick(TOPICS), opts: { filter: `year ${y} TO ${y + 50} AND category = ${pick(CATS)}` } }; },
  facets: () => { const y = int(1500, 1800); return { q: pick(TOPICS), opts: { filter: [`year >= ${y}`], facets: ['category', 'decade'] } }; },
  'placeholder + facets': () => ({ q: null, opts: { facets: ['category', 'decade'] } }),
  'topic + sort': () => ({ q: pick(TOPICS), opts: { sort: ['year:desc'] } }),
  'two words, all + highlight': () => ({ q: `${pick(TOPICS)} ${pick(TOPICS)}`, opts: { matchingStrategy: 'all', attributesToHighlight: ['title'], attributesToCrop: ['body:20'] } }),
  // Added after the others (keeps their seeded queries unchanged): frequent words whose postings intersect widely.
  'phrase (two topic words)': () => ({ q: `"${pick(TOPICS)} ${pick(TOPICS)}"` }),
};
// Wall time, and this process's CPU time (server + in-process client), which stays meaningful on a busy shared machine.
console.log('kind'.padEnd(30), 'p50 ms'.padStart(8), 'p95 ms'.padStart(8), 'cpu p50'.padStart(8), 'cpu p95'.padStart(8), 'hits(avg)'.padStart(10));
for (const [name, make] of Object.entries(kinds)) {
  const times: number[] = [];
  const cpu: number[] = [];
  let hits = 0;
  for (let i = 0; i < RUNS + 10; i++) {
    const { q, opts } = make();
    const s = performance.now();
    const c = process.cpuUsage();
    const r = await index.search(q, opts);
    const used = process.cpuUsage(c);
    if (i >= 10) { times.push(performance.now() - s); cpu.push((used.user + used.system) / 1000); hits += r.estimatedTotalHits ?? 0; }
  }
  console.log(name.padEnd(30), pct(times, 50).toFixed(1).padStart(8), pct(times, 95).toFixed(1).padStart(8), pct(cpu, 50).toFixed(1).padStart(8), pct(cpu, 95).toFixed(1).padStart(8), (hits / RUNS).toFixed(0).padStart(10));
}
await svc.close();
