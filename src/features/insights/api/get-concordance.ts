import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ConcordanceEntry } from '@shared/review/types';
import { api } from '@/lib/api';

/** `GET /api/concordance` → `{ data: ConcordanceEntry[], abilities }` (the concordance route's shape). */
export interface ConcordanceResponse {
  data: ConcordanceEntry[];
}

export function getConcordance(signal?: AbortSignal): Promise<ConcordanceResponse> {
  return api.get<ConcordanceResponse>('/api/concordance', { signal });
}

export function concordanceQueryOptions() {
  return queryOptions({ queryKey: ['concordance', 'picture'] as const, queryFn: ({ signal }) => getConcordance(signal), staleTime: 60_000 });
}

export function useConcordancePicture() {
  return useQuery(concordanceQueryOptions());
}
