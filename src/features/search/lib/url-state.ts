import { searchQuerySchema, type SearchQuery } from '@shared/search/schema';
import { buildUrl } from '@/lib/api';
import { searchParamsOf } from '../api/search-excerpts';

/**
 * The search lives in the URL. Reading drops parameters that do not validate (a
 * hand-edited or outdated link still opens), so the page never asks for a 400.
 */
export function queryFromUrl(params: URLSearchParams): SearchQuery {
  const raw: Record<string, string> = {};
  for (const [key, value] of params) raw[key] = key in raw ? `${raw[key]},${value}` : value;
  for (let attempt = 0; attempt < 12; attempt++) {
    const parsed = searchQuerySchema.safeParse(raw);
    if (parsed.success) return parsed.data;
    const bad = new Set(parsed.error.issues.map((i) => String(i.path[0] ?? '')));
    for (const issue of parsed.error.issues) if (issue.code === 'unrecognized_keys') issue.keys.forEach((k) => bad.add(k));
    for (const key of bad) delete raw[key];
  }
  return searchQuerySchema.parse({});
}

export function urlOf(query: SearchQuery): string {
  return buildUrl('/search', searchParamsOf(query));
}

/** A change to anything but the page starts again at page 1. */
export function withChange(query: SearchQuery, change: Partial<SearchQuery>): SearchQuery {
  return { ...query, page: 1, ...change };
}

export const hasFilters = (q: SearchQuery) =>
  q.size.length + q.family.length + q.type.length + q.lang.length > 0 ||
  q.from !== undefined || q.to !== undefined || q.aMin !== undefined || q.aMax !== undefined;
