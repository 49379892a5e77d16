/**
 * The five query kinds, generated from the corpus with the same seed, run three
 * ways: through `GET /api/search` over HTTP, and as the SQL a team would otherwise
 * write (MariaDB FULLTEXT in boolean mode, and LIKE '%…%'): a page of 20, the total,
 * and counts by size and by source type (the API also counts families, languages
 * and decades, which the SQL baselines leave out).
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import { Corpus, LANGS, SIZE_TERMS, type Lang } from './corpus';
import type { SourceType } from '@shared/catalogue/vocabulary';

export const KINDS = ['one word', 'phrase', 'word + facets', 'filters only', 'word + pitch & years'] as const;
export type Kind = (typeof KINDS)[number];

export interface BenchQuery {
  q?: string;
  phrase?: boolean;
  size?: string;
  lang?: Lang;
  type?: SourceType;
  from?: number;
  to?: number;
  aMin?: number;
  aMax?: number;
}

const TYPES: SourceType[] = ['treatise', 'tutor', 'account', 'inventory', 'letter', 'court-record', 'music-preface'];

export function makeQueries(corpus: Corpus, perKind: number): Record<Kind, BenchQuery[]> {
  const word = () => corpus.pick(corpus.queryWords.get(corpus.pick(LANGS))!);
  const size = () => corpus.pick(SIZE_TERMS).slug;
  const out = {} as Record<Kind, BenchQuery[]>;
  for (const kind of KINDS) {
    out[kind] = Array.from({ length: perKind }, (): BenchQuery => {
      const y = corpus.int(1550, 1750);
      switch (kind) {
        case 'one word': return { q: word() };
        case 'phrase': return { q: corpus.pick(corpus.phrases), phrase: true };
        case 'word + facets': return { q: word(), size: size(), lang: corpus.pick(LANGS) };
        case 'filters only': return { type: corpus.pick(TYPES), size: size(), from: y, to: y + 50 };
        default: return { q: word(), from: y, to: y + 60, aMin: 405, aMax: 425 };
      }
    });
  }
  return out;
}

export function apiPath(b: BenchQuery): string {
  const p = new URLSearchParams();
  if (b.q) p.set('q', b.phrase ? `"${b.q}"` : b.q);
  for (const k of ['size', 'lang', 'type', 'from', 'to', 'aMin', 'aMax'] as const) if (b[k] !== undefined) p.set(k, String(b[k]));
  return `/api/search?${p}`;
}

/** The same question in SQL: [page, total, sizes facet, type facet]. */
export function sqlFor(b: BenchQuery, mode: 'fulltext' | 'like'): { sql: string; replacements: unknown[] }[] {
  const where: string[] = ["e.status = 'approved'", "s.status = 'approved'"];
  const params: unknown[] = [];
  let score = '0';
  const scoreParams: unknown[] = [];
  if (b.q) {
    if (mode === 'fulltext') {
      const against = b.phrase ? `+"${b.q}"` : `+${b.q}*`;
      where.push('MATCH(e.diplomatic, e.normalised, e.translation, e.commentary) AGAINST (? IN BOOLEAN MODE)');
      params.push(against);
      score = 'MATCH(e.diplomatic, e.normalised, e.translation, e.commentary) AGAINST (? IN BOOLEAN MODE)';
      scoreParams.push(against);
    } else {
      const like = `%${b.q}%`;
      where.push('(e.diplomatic LIKE ? OR e.normalised LIKE ? OR e.translation LIKE ? OR e.commentary LIKE ?)');
      params.push(like, like, like, like);
    }
  }
  if (b.size) { where.push('EXISTS (SELECT 1 FROM instrument_mentions f WHERE f.excerpt_id = e.id AND f.size_slug = ?)'); params.push(b.size); }
  if (b.lang) { where.push('JSON_CONTAINS(s.languages, ?)'); params.push(JSON.stringify(b.lang)); }
  if (b.type) { where.push('s.source_type = ?'); params.push(b.type); }
  if (b.from !== undefined) { where.push('YEAR(COALESCE(e.date_latest, s.date_latest)) >= ?'); params.push(b.from); }
  if (b.to !== undefined) { where.push('YEAR(COALESCE(e.date_earliest, s.date_earliest)) <= ?'); params.push(b.to); }
  if (b.aMin !== undefined) { where.push('EXISTS (SELECT 1 FROM pitch_tags p WHERE p.excerpt_id = e.id AND p.a_hz BETWEEN ? AND ?)'); params.push(b.aMin, b.aMax); }
  const from = `FROM excerpts e JOIN sources s ON s.id = e.source_id WHERE ${where.join(' AND ')}`;
  return [
    { sql: `SELECT e.public_id, s.title, ${score} AS score ${from} ORDER BY score DESC, e.id LIMIT 20`, replacements: [...scoreParams, ...params] },
    { sql: `SELECT COUNT(*) AS n ${from}`, replacements: params },
    { sql: `SELECT m.size_slug, COUNT(DISTINCT e.id) AS n FROM instrument_mentions m JOIN excerpts e ON e.id = m.excerpt_id JOIN sources s ON s.id = e.source_id WHERE ${where.join(' AND ')} GROUP BY m.size_slug`, replacements: params },
    { sql: `SELECT s.source_type, COUNT(*) AS n ${from} GROUP BY s.source_type`, replacements: params },
  ];
}

export interface Latency { n: number; p50: number; p95: number; p99: number; meanHits: number; timedOut: number; inner?: Latency }

export function percentiles(ms: number[], hits: number[], timedOut = 0): Latency {
  const s = [...ms].sort((a, b) => a - b);
  const at = (p: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))];
  return { n: s.length, p50: at(50), p95: at(95), p99: at(99), meanHits: hits.reduce((a, b) => a + b, 0) / Math.max(1, hits.length), timedOut };
}

/** Runs `warm` queries unmeasured, then all of them one at a time; `run` returns [hits, inner ms]. */
async function timed<T>(queries: T[], warm: number, run: (q: T) => Promise<[number, number]>): Promise<Latency> {
  for (const q of queries.slice(0, warm)) await run(q);
  const ms: number[] = [];
  const inner: number[] = [];
  const hits: number[] = [];
  let timedOut = 0;
  for (const q of queries) {
    const t = performance.now();
    const [n, innerMs] = await run(q);
    ms.push(performance.now() - t);
    if (n < 0) timedOut++;
    else hits.push(n);
    inner.push(innerMs);
  }
  return { ...percentiles(ms, hits, timedOut), inner: percentiles(inner, hits) };
}

/** Through the API over HTTP; `inner` is the app's own round trip to the search service (`processingTimeMs`). */
export function runApi(baseUrl: string, queries: BenchQuery[], warm = 10): Promise<Latency> {
  return timed(queries, warm, async (q) => {
    const res = await fetch(baseUrl + apiPath(q));
    if (!res.ok) throw new Error(`${apiPath(q)} → ${res.status} ${await res.text()}`);
    const body = (await res.json()) as { total: number; processingTimeMs: number };
    return [body.total, body.processingTimeMs];
  });
}

/** The SQL statements of one question; a statement over `limitS` seconds is stopped and counted as timed out. */
export function runSql(sequelize: Sequelize, queries: BenchQuery[], mode: 'fulltext' | 'like', warm = 3, limitS = 30): Promise<Latency> {
  return timed(queries, warm, async (q) => {
    let total = 0;
    for (const [i, stmt] of sqlFor(q, mode).entries()) {
      try {
        const rows = await sequelize.query<{ n: number }>(`SET STATEMENT max_statement_time=${limitS} FOR ${stmt.sql}`, { replacements: stmt.replacements, type: QueryTypes.SELECT });
        if (i === 1) total = Number(rows[0]?.n ?? 0);
      } catch (error) {
        if (!/max_statement_time|interrupted/i.test(String(error))) throw error;
        return [-1, 0];
      }
    }
    return [total, 0];
  });
}
