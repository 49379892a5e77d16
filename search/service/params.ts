/**
 * Search parameters: validation of POST bodies and conversion of GET query
 * strings, with Meilisearch's `invalid_search_*` codes and `bad_request` for
 * unknown fields.
 */
import { ApiError, describeValue } from './errors';

export interface SearchParams {
  q: string | null;
  offset: number;
  limit: number;
  page: number;
  hitsPerPage: number;
  pageMode: boolean;
  filter: unknown;
  facets: string[] | null;
  attributesToRetrieve: string[];
  attributesToHighlight: string[] | null;
  highlightPreTag: string;
  highlightPostTag: string;
  attributesToCrop: string[] | null;
  cropLength: number;
  cropMarker: string;
  showMatchesPosition: boolean;
  sort: string[] | null;
  matchingStrategy: 'last' | 'all' | 'frequency';
  showRankingScore: boolean;
  attributesToSearchOn: string[] | null;
}

const FIELDS = ['q', 'offset', 'limit', 'page', 'hitsPerPage', 'filter', 'facets', 'attributesToRetrieve', 'attributesToHighlight', 'highlightPreTag', 'highlightPostTag', 'attributesToCrop', 'cropLength', 'cropMarker', 'showMatchesPosition', 'sort', 'matchingStrategy', 'showRankingScore', 'attributesToSearchOn'];
/** Accepted when they carry their neutral value (the client may send them), refused otherwise. */
const NEUTRAL: Record<string, (v: unknown) => boolean> = {
  vector: (v) => v === null, hybrid: (v) => v === null, retrieveVectors: (v) => v === false || v === null,
  showRankingScoreDetails: (v) => v === false || v === null, showPerformanceDetails: (v) => v === false || v === null,
  locales: () => true, distinct: (v) => v === null, rankingScoreThreshold: (v) => v === null,
};

const snake = (k: string) => k.replace(/[A-Z]/g, (c) => '_' + c.toLowerCase());
const err = (k: string, expected: string, v: unknown) =>
  new ApiError(`invalid_search_${snake(k)}`, `Invalid value type at \`.${k}\`: expected ${expected}, but found ${describeValue(v)}`);

function posInt(k: string, v: unknown): number {
  if (typeof v !== 'number' || !Number.isInteger(v) || v < 0) throw err(k, 'a positive integer', v);
  return v;
}
function str(k: string, v: unknown): string { if (typeof v !== 'string') throw err(k, 'a string', v); return v; }
function bool(k: string, v: unknown): boolean { if (typeof v !== 'boolean') throw err(k, 'a boolean', v); return v; }
function strs(k: string, v: unknown): string[] {
  if (!Array.isArray(v) || v.some((x) => typeof x !== 'string')) throw err(k, 'an array of strings', v);
  return v as string[];
}

/** Validates a POST search body (or one multi-search query with `extra` fields allowed). */
export function parseSearchBody(body: unknown, extra: string[] = []): SearchParams {
  if (!body || typeof body !== 'object' || Array.isArray(body)) throw new ApiError('bad_request', `Invalid value type: expected an object, but found ${describeValue(body)}`);
  const b = body as Record<string, unknown>;
  for (const [k, v] of Object.entries(b)) {
    if (FIELDS.includes(k) || extra.includes(k) || v === undefined) continue;
    if (k in NEUTRAL) { if (NEUTRAL[k](v)) continue; throw new ApiError('bad_request', `The local search service does not support \`${k}\`.`); }
    throw new ApiError('bad_request', `Unknown field \`${k}\`: expected one of ${FIELDS.map((x) => `\`${x}\``).join(', ')}`);
  }
  const has = (k: string) => b[k] !== undefined && b[k] !== null;
  const p: SearchParams = {
    q: has('q') ? str('q', b.q) : null,
    offset: has('offset') ? posInt('offset', b.offset) : 0,
    limit: has('limit') ? posInt('limit', b.limit) : 20,
    page: has('page') ? posInt('page', b.page) : 1,
    hitsPerPage: has('hitsPerPage') ? posInt('hitsPerPage', b.hitsPerPage) : 20,
    pageMode: has('page') || has('hitsPerPage'),
    filter: b.filter ?? null,
    facets: has('facets') ? strs('facets', b.facets) : null,
    attributesToRetrieve: has('attributesToRetrieve') ? strs('attributesToRetrieve', b.attributesToRetrieve) : ['*'],
    attributesToHighlight: has('attributesToHighlight') ? strs('attributesToHighlight', b.attributesToHighlight) : null,
    highlightPreTag: has('highlightPreTag') ? str('highlightPreTag', b.highlightPreTag) : '<em>',
    highlightPostTag: has('highlightPostTag') ? str('highlightPostTag', b.highlightPostTag) : '</em>',
    attributesToCrop: has('attributesToCrop') ? strs('attributesToCrop', b.attributesToCrop) : null,
    cropLength: has('cropLength') ? posInt('cropLength', b.cropLength) : 10,
    cropMarker: has('cropMarker') ? str('cropMarker', b.cropMarker) : '…',
    showMatchesPosition: has('showMatchesPosition') ? bool('showMatchesPosition', b.showMatchesPosition) : false,
    sort: has('sort') ? strs('sort', b.sort) : null,
    matchingStrategy: 'last',
    showRankingScore: has('showRankingScore') ? bool('showRankingScore', b.showRankingScore) : false,
    attributesToSearchOn: has('attributesToSearchOn') ? strs('attributesToSearchOn', b.attributesToSearchOn) : null,
  };
  if (has('matchingStrategy')) {
    const m = b.matchingStrategy;
    if (m !== 'last' && m !== 'all' && m !== 'frequency') throw new ApiError('invalid_search_matching_strategy', `Unknown value \`${String(m)}\` at \`.matchingStrategy\`: expected one of \`last\`, \`all\`, \`frequency\``);
    p.matchingStrategy = m;
  }
  if (p.filter !== null && typeof p.filter !== 'string' && !Array.isArray(p.filter)) throw err('filter', 'a string or an array', p.filter);
  if (p.pageMode && p.page === 0) throw new ApiError('invalid_search_page', 'Invalid value at `.page`: value can\'t be 0');
  return p;
}

const INTS = ['offset', 'limit', 'page', 'hitsPerPage', 'cropLength'];
const BOOLS = ['showMatchesPosition', 'showRankingScore', 'retrieveVectors', 'showRankingScoreDetails', 'showPerformanceDetails'];
const LISTS = ['facets', 'attributesToRetrieve', 'attributesToHighlight', 'attributesToCrop', 'sort', 'attributesToSearchOn', 'locales'];

/** GET /search: query-string values → the POST body shape (arrays are comma-joined by the client). */
export function parseSearchQuery(params: URLSearchParams): SearchParams {
  const b: Record<string, unknown> = {};
  for (const [k, v] of params) {
    if (INTS.includes(k)) {
      if (!/^\d+$/.test(v)) throw new ApiError(`invalid_search_${snake(k)}`, `Invalid value in parameter \`${k}\`: could not parse \`${v}\` as a positive integer`);
      b[k] = Number(v);
    } else if (BOOLS.includes(k)) {
      if (v !== 'true' && v !== 'false') throw new ApiError(`invalid_search_${snake(k)}`, `Invalid value in parameter \`${k}\`: could not parse \`${v}\` as a boolean, expected either \`true\` or \`false\``);
      b[k] = v === 'true';
    } else if (LISTS.includes(k)) b[k] = v === '' ? [] : v.split(',').map((s) => s.trim());
    else b[k] = v;
  }
  return parseSearchBody(b);
}
