import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { InsightsResponse } from '@shared/insights/schema';
import { api } from '@/lib/api';

export const insightsQueryKey = ['insights'] as const;

/** `GET /api/insights?…` with a query string already built from the page's filters. */
export function getInsights(queryString: string, signal?: AbortSignal): Promise<InsightsResponse> {
  return api.get<InsightsResponse>(`/api/insights${queryString ? `?${queryString}` : ''}`, { signal });
}

export function insightsQueryOptions(queryString: string) {
  return queryOptions({
    queryKey: [...insightsQueryKey, queryString],
    queryFn: ({ signal }) => getInsights(queryString, signal),
    placeholderData: keepPreviousData,
    staleTime: 30_000,
  });
}

export function useInsights(queryString: string) {
  return useQuery(insightsQueryOptions(queryString));
}
