/**
 * The pictures of a search, read from the search index so they follow the same
 * filters and the same visibility as `GET /api/search`: the filter clauses come from
 * search/query.ts's `buildFilter` (whitelisted values, quoted; the visibility clause
 * from the session, never from the request), one multi-search request of three
 * queries: the decade facet and total, the dated spans, the pitch-tagged excerpts.
 */
import type { Meilisearch, MultiSearchQuery, SearchResponse as MeiliResponse } from 'meilisearch';
import { buildFilter, type Viewer } from '@search/query';
import { excerptsUid } from '@search/settings';
import { centsBetween, MODERN_A4_HZ, roundTo } from '@shared/reckoner/pitch';
import { YEAR_RANGE } from '@shared/search/schema';
import {
  asSearchQuery, DECADES, PITCH_CAP, TIMELINE_CAP,
  type InsightsQuery, type InsightsResponse, type PitchPoint, type TimelineSpan,
} from '@shared/insights/schema';

type Doc = Record<string, unknown>;

/** Only dated excerpts overlapping the archive's period can be drawn. */
const windowClauses = [`yearEarliest <= ${YEAR_RANGE.max}`, `yearLatest >= ${YEAR_RANGE.min}`];
const retrieve = ['excerptId', 'sourceId', 'sourceTitle', 'yearEarliest', 'yearLatest', 'sizes', 'dateLabel', 'aHz'];

const QUALIFIED = /\bc\.|uncertain|before|after|or earlier|or later|\?|~|%/i;

const strings = (v: unknown): string[] => (Array.isArray(v) ? v.map(String) : []);
const numbers = (v: unknown): number[] => (Array.isArray(v) ? v.map(Number).filter((n) => Number.isFinite(n) && n > 0) : []);

export function toSpan(doc: Doc): TimelineSpan {
  const yearEarliest = Number(doc.yearEarliest);
  const yearLatest = Number(doc.yearLatest);
  const dateLabel = String(doc.dateLabel ?? '');
  return {
    excerptId: String(doc.excerptId),
    sourceId: String(doc.sourceId),
    sourceTitle: String(doc.sourceTitle ?? ''),
    yearEarliest,
    yearLatest,
    sizes: strings(doc.sizes),
    dateLabel,
    approximate: yearLatest > yearEarliest || QUALIFIED.test(dateLabel),
  };
}

/** One point per a′ of the excerpt, inside the aMin/aMax the search asked for. */
export function toPoints(doc: Doc, query: Pick<InsightsQuery, 'aMin' | 'aMax'>): PitchPoint[] {
  const span = toSpan(doc);
  return numbers(doc.aHz)
    .filter((hz) => (query.aMin === undefined || hz >= query.aMin) && (query.aMax === undefined || hz <= query.aMax))
    .map((aHz) => ({
      excerptId: span.excerptId,
      sourceTitle: span.sourceTitle,
      year: (span.yearEarliest + span.yearLatest) / 2,
      yearEarliest: span.yearEarliest,
      yearLatest: span.yearLatest,
      dateLabel: span.dateLabel,
      aHz,
      cents: roundTo(centsBetween(MODERN_A4_HZ, aHz), 1),
      sizes: span.sizes,
    }));
}

const empty = (): InsightsResponse => ({
  timeline: { spans: [], truncated: false, decades: DECADES.map((decade) => ({ decade, count: 0 })) },
  pitch: { points: [], truncated: false },
  total: 0,
});

const totalOf = (r: MeiliResponse<Doc>) => r.totalHits ?? r.estimatedTotalHits ?? 0;

export async function buildInsights(client: Meilisearch, query: InsightsQuery, viewer: Viewer | null | undefined): Promise<InsightsResponse> {
  const indexUid = excerptsUid();
  const filter = buildFilter(asSearchQuery(query), query.scope === 'public' ? null : viewer);
  const base = { indexUid, q: query.q, matchingStrategy: 'all' as const };
  const queries: MultiSearchQuery[] = [
    { ...base, filter, facets: ['decades'], page: 1, hitsPerPage: 0 },
    { ...base, filter: [...filter, ...windowClauses], sort: ['yearEarliest:asc'], page: 1, hitsPerPage: TIMELINE_CAP, attributesToRetrieve: retrieve },
    { ...base, filter: [...filter, ...windowClauses, 'aHz > 0'], sort: ['yearEarliest:asc'], page: 1, hitsPerPage: PITCH_CAP, attributesToRetrieve: retrieve },
  ];
  let results: MeiliResponse<Doc>[];
  try {
    ({ results } = (await client.multiSearch({ queries })) as { results: MeiliResponse<Doc>[] });
  } catch (error) {
    // Nothing indexed yet on a fresh install: an empty archive, not an outage.
    if ((error as { cause?: { code?: string } }).cause?.code === 'index_not_found') return empty();
    throw error;
  }
  const [counts, spans, pitch] = results;
  const facet = counts.facetDistribution?.decades ?? {};
  return {
    timeline: {
      spans: spans.hits.map(toSpan),
      truncated: totalOf(spans) > spans.hits.length,
      decades: DECADES.map((decade) => ({ decade, count: facet[String(decade)] ?? 0 })),
    },
    pitch: {
      points: pitch.hits.flatMap((doc) => toPoints(doc, query)),
      truncated: totalOf(pitch) > pitch.hits.length,
    },
    total: totalOf(counts),
  };
}
