import { queryOptions, useQuery } from '@tanstack/react-query';
import type { InstrumentSizeView } from '@shared/catalogue/types';
import { api } from '@/lib/api';

export const sizesQueryKey = ['sizes'] as const;

export function getSizes(signal?: AbortSignal): Promise<{ data: InstrumentSizeView[] }> {
  return api.get<{ data: InstrumentSizeView[] }>('/api/sizes', { signal });
}

/** The size vocabulary changes rarely (editors extend it), so it stays fresh for ten minutes. */
export function getSizesQueryOptions() {
  return queryOptions({
    queryKey: sizesQueryKey,
    queryFn: ({ signal }) => getSizes(signal),
    staleTime: 10 * 60_000,
  });
}

export function useSizes() {
  return useQuery(getSizesQueryOptions());
}
