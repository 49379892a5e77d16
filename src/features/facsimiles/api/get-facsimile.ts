import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FacsimileView } from '@shared/catalogue/types';
import { api } from '@/lib/api';

export const facsimilesQueryKey = ['facsimiles'] as const;

export function facsimileQueryKey(id: number) {
  return [...facsimilesQueryKey, 'detail', id] as const;
}

export function getFacsimile(id: number, signal?: AbortSignal): Promise<{ data: FacsimileView }> {
  return api.get<{ data: FacsimileView }>(`/api/facsimiles/${id}`, { signal });
}

/** While text is being extracted, asks again every second; stops once it is done or failed. */
export function getFacsimileQueryOptions(id: number) {
  return queryOptions({
    queryKey: facsimileQueryKey(id),
    queryFn: ({ signal }) => getFacsimile(id, signal),
    refetchInterval: (query) => {
      const status = query.state.data?.data.extractionStatus;
      return status === 'pending' || status === 'running' ? 1000 : false;
    },
  });
}

export function useFacsimile(id: number, options: { enabled?: boolean } = {}) {
  return useQuery({ ...getFacsimileQueryOptions(id), enabled: options.enabled ?? true });
}
