import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SourceResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { sourcesQueryKey } from './get-sources';

export function sourceQueryKey(id: string) {
  return [...sourcesQueryKey, 'detail', id] as const;
}

export function getSource(id: string, signal?: AbortSignal): Promise<SourceResponse> {
  return api.get<SourceResponse>(`/api/sources/${encodeURIComponent(id)}`, { signal });
}

export function getSourceQueryOptions(id: string) {
  return queryOptions({
    queryKey: sourceQueryKey(id),
    queryFn: ({ signal }) => getSource(id, signal),
  });
}

/** Waits while `id` is empty (e.g. until the excerpt that names the source has loaded). */
export function useSource(id: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getSourceQueryOptions(id), enabled: (options.enabled ?? true) && id !== '' });
}
