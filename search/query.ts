/**
 * Runs a validated `GET /api/search` query against the excerpts index.
 *
 * The filter is built here, by the server, from whitelisted values only: every string
 * is quoted and escaped, numbers are printed from numbers, and the visibility clause
 * (from the signed-in user, never from the request) is ANDed in as its own element of
 * the array form, so nothing in the query string can widen what a person sees.
 *
 * Facet counts are disjunctive: a group with ticked values (sizes alto + tenor) is
 * counted without its own selection, so the other values show what ticking them adds;
 * groups without a selection are counted over the current results.
 */
import type { Meilisearch, MultiSearchQuery, SearchResponse as MeiliResponse } from 'meilisearch';
import type { Role } from '@shared/schemas/auth';
import { facetNames, type FacetName, type SearchHit, type SearchQuery, type SearchResponse } from '@shared/search/schema';
import type { SourceType } from '@shared/catalogue/vocabulary';
import { excerptsUid } from './settings';

export interface Viewer {
  id: number;
  role: Role;
}

/** A filter value as a double-quoted string: `\` and `"` escaped, so it is always one value. */
export function quote(value: string): string {
  return `"${value.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
}

const num = (n: number) => {
  if (!Number.isFinite(n)) throw new Error(`Not a number in a search filter: ${n}`);
  return String(n);
};

/** What the viewer may find: the public; plus their own drafts; editors everything. */
export function visibilityFilter(viewer: Viewer | null | undefined): string | null {
  if (viewer && (viewer.role === 'editor' || viewer.role === 'admin')) return null;
  if (viewer && viewer.role === 'contributor') return `(visibility = "public" OR ownerIds = ${num(Math.trunc(viewer.id))})`;
  return 'visibility = "public"';
}

/** Which facet group each list parameter filters. */
const facetParams: Record<Exclude<FacetName, 'decades'>, 'size' | 'family' | 'type' | 'lang'> = {
  sizes: 'size',
  families: 'family',
  sourceType: 'type',
  languages: 'lang',
};

function inList(attribute: string, values: readonly string[]): string {
  return `${attribute} IN [${values.map(quote).join(', ')}]`;
}

/** The filter clauses (array form: all must hold), leaving out one facet group's own selection. */
export function buildFilter(query: SearchQuery, viewer: Viewer | null | undefined, without?: FacetName): string[] {
  const clauses: string[] = [];
  const visibility = visibilityFilter(viewer);
  if (visibility) clauses.push(visibility);
  for (const [facet, param] of Object.entries(facetParams) as [FacetName, 'size' | 'family' | 'type' | 'lang'][]) {
    const values = query[param];
    if (values.length && facet !== without) clauses.push(inList(facet, values));
  }
  if (query.from !== undefined) clauses.push(`yearLatest >= ${num(query.from)}`);
  if (query.to !== undefined) clauses.push(`yearEarliest <= ${num(query.to)}`);
  if (query.aMin !== undefined && query.aMax !== undefined) clauses.push(`aHz ${num(query.aMin)} TO ${num(query.aMax)}`);
  else if (query.aMin !== undefined) clauses.push(`aHz >= ${num(query.aMin)}`);
  else if (query.aMax !== undefined) clauses.push(`aHz <= ${num(query.aMax)}`);
  return clauses;
}

const sorts: Record<SearchQuery['sort'], string[] | undefined> = {
  relevance: undefined,
  oldest: ['yearEarliest:asc'],
  newest: ['yearLatest:desc'],
  title: ['sourceTitle:asc'],
};

const snippetFields = ['diplomatic', 'normalised', 'translation', 'commentary'] as const;
const PRE = '\uE000';
const POST = '\uE001';
const CROP_WORDS = 36;

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Escapes the passage, then turns our private highlight tags into `<mark>`. */
export function toSnippet(formatted: string): string {
  return escapeHtml(formatted).replaceAll(PRE, '<mark>').replaceAll(POST, '</mark>');
}

type Doc = Record<string, unknown> & { _formatted?: Record<string, unknown> };

function presentHit(hit: Doc): SearchHit {
  const f = hit._formatted ?? {};
  const field = snippetFields.find((k) => typeof f[k] === 'string' && (f[k] as string).includes(PRE)) ?? 'diplomatic';
  return {
    excerptId: String(hit.excerptId),
    sourceId: String(hit.sourceId),
    sourceTitle: String(hit.sourceTitle ?? ''),
    locator: String(hit.locator ?? ''),
    snippet: toSnippet(String(f[field] ?? hit[field] ?? '')),
    snippetField: field,
    sizes: (hit.sizes as string[]) ?? [],
    aHz: (hit.aHz as number[]) ?? [],
    dateLabel: String(hit.dateLabel ?? ''),
    sourceType: hit.sourceType as SourceType,
    languages: (hit.languages as string[]) ?? [],
    status: String(hit.status ?? ''),
  };
}

const emptyFacets = (): SearchResponse['facets'] => ({ sizes: {}, families: {}, sourceType: {}, languages: {}, decades: {} });

/** The search, as one multi-search request: the results plus one count query per ticked facet group. */
export async function searchExcerpts(client: Meilisearch, query: SearchQuery, viewer: Viewer | null | undefined): Promise<SearchResponse> {
  const started = performance.now();
  const indexUid = excerptsUid();
  const ticked = (Object.keys(facetParams) as (keyof typeof facetParams)[]).filter((f) => query[facetParams[f]].length > 0);
  const main: MultiSearchQuery = {
    indexUid,
    q: query.q,
    filter: buildFilter(query, viewer),
    facets: facetNames.filter((f) => !ticked.includes(f as keyof typeof facetParams)),
    page: query.page,
    hitsPerPage: query.perPage,
    sort: sorts[query.sort],
    matchingStrategy: 'all',
    attributesToRetrieve: ['excerptId', 'sourceId', 'sourceTitle', 'locator', 'sizes', 'aHz', 'dateLabel', 'sourceType', 'languages', 'status', ...snippetFields],
    attributesToHighlight: [...snippetFields],
    attributesToCrop: [...snippetFields],
    cropLength: CROP_WORDS,
    highlightPreTag: PRE,
    highlightPostTag: POST,
  };
  const counts: MultiSearchQuery[] = ticked.map((facet) => ({
    indexUid,
    q: query.q,
    filter: buildFilter(query, viewer, facet),
    facets: [facet],
    limit: 0,
    matchingStrategy: 'all',
  }));

  let results: MeiliResponse<Doc>[];
  try {
    ({ results } = (await client.multiSearch({ queries: [main, ...counts] })) as { results: MeiliResponse<Doc>[] });
  } catch (error) {
    // Nothing indexed yet on a fresh install: an empty archive, not an outage.
    if ((error as { cause?: { code?: string } }).cause?.code === 'index_not_found') {
      return { hits: [], total: 0, facets: emptyFacets(), page: query.page, perPage: query.perPage, processingTimeMs: 0 };
    }
    throw error;
  }
  const [first, ...rest] = results;
  const facets = emptyFacets();
  for (const name of facetNames) Object.assign(facets[name], first.facetDistribution?.[name] ?? {});
  rest.forEach((r, i) => Object.assign(facets[ticked[i]], r.facetDistribution?.[ticked[i]] ?? {}));
  return {
    hits: first.hits.map(presentHit),
    total: first.totalHits ?? first.estimatedTotalHits ?? 0,
    facets,
    page: query.page,
    perPage: query.perPage,
    processingTimeMs: Math.round(performance.now() - started),
  };
}
