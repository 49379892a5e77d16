import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { Paged, SourceSummary } from '@shared/catalogue/types';
import type { SourceType, WorkflowState } from '@shared/catalogue/vocabulary';
import { api } from '@/lib/api';

export const sourceSortFields = ['title', 'date', 'updatedAt'] as const;
export type SourceSortField = (typeof sourceSortFields)[number];

export interface SourcesQuery {
  page: number;
  perPage: number;
  /** A sort field, ascending; prefixed with "-" for descending, e.g. "-date". */
  sort?: string;
  type?: SourceType;
  status?: WorkflowState;
  /** Years. */
  from?: number;
  to?: number;
  lang?: string;
  q?: string;
  /** Only the signed-in contributor's own sources. */
  mine?: boolean;
}

export const sourcesQueryKey = ['sources'] as const;

export function getSources(query: SourcesQuery, signal?: AbortSignal): Promise<Paged<SourceSummary>> {
  const { mine, ...rest } = query;
  return api.get<Paged<SourceSummary>>('/api/sources', { params: { ...rest, mine: mine ? 1 : undefined }, signal });
}

export function getSourcesQueryOptions(query: SourcesQuery) {
  return queryOptions({
    queryKey: [...sourcesQueryKey, 'list', query] as const,
    queryFn: ({ signal }) => getSources(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useSources(query: SourcesQuery) {
  return useQuery(getSourcesQueryOptions(query));
}
