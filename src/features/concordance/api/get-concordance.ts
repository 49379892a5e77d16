import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ConcordanceEntry } from '@shared/review/types';
import { api } from '@/lib/api';

export const concordanceQueryKey = ['concordance'] as const;

export interface ConcordanceResponse {
  data: ConcordanceEntry[];
  abilities: { edit: boolean };
}

export function getConcordance(signal?: AbortSignal): Promise<ConcordanceResponse> {
  return api.get<ConcordanceResponse>('/api/concordance', { signal });
}

export function getConcordanceQueryOptions() {
  return queryOptions({ queryKey: concordanceQueryKey, queryFn: ({ signal }) => getConcordance(signal) });
}

export function useConcordance() {
  return useQuery(getConcordanceQueryOptions());
}
