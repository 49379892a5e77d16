import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ExcerptResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';

export const excerptsQueryKey = ['excerpts'] as const;

export function excerptQueryKey(id: string) {
  return [...excerptsQueryKey, 'detail', id] as const;
}

export function getExcerpt(id: string, signal?: AbortSignal): Promise<ExcerptResponse> {
  return api.get<ExcerptResponse>(`/api/excerpts/${encodeURIComponent(id)}`, { signal });
}

export function getExcerptQueryOptions(id: string) {
  return queryOptions({
    queryKey: excerptQueryKey(id),
    queryFn: ({ signal }) => getExcerpt(id, signal),
  });
}

export function useExcerpt(id: string) {
  return useQuery(getExcerptQueryOptions(id));
}
