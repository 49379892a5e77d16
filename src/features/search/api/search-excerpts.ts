import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { SearchQuery, SearchResponse } from '@shared/search/schema';
import { api, type QueryParams } from '@/lib/api';

export const searchQueryKey = ['search'] as const;

/** The query as URL parameters: lists joined with commas, defaults left out. */
export function searchParamsOf(query: SearchQuery): QueryParams {
  return {
    q: query.q || undefined,
    size: query.size.join(',') || undefined,
    family: query.family.join(',') || undefined,
    type: query.type.join(',') || undefined,
    lang: query.lang.join(',') || undefined,
    from: query.from,
    to: query.to,
    aMin: query.aMin,
    aMax: query.aMax,
    page: query.page > 1 ? query.page : undefined,
    perPage: query.perPage !== 20 ? query.perPage : undefined,
    sort: query.sort !== 'relevance' ? query.sort : undefined,
  };
}

export function searchExcerpts(query: SearchQuery, signal?: AbortSignal): Promise<SearchResponse> {
  return api.get<SearchResponse>('/api/search', { params: searchParamsOf(query), signal });
}

export function searchExcerptsQueryOptions(query: SearchQuery) {
  return queryOptions({
    queryKey: [...searchQueryKey, query] as const,
    queryFn: ({ signal }) => searchExcerpts(query, signal),
    placeholderData: keepPreviousData,
    staleTime: 15_000,
  });
}

export function useSearchExcerpts(query: SearchQuery) {
  return useQuery(searchExcerptsQueryOptions(query));
}
