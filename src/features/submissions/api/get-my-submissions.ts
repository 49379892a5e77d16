import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MySubmission } from '@shared/review/types';
import { api } from '@/lib/api';

export const submissionsQueryKey = ['submissions'] as const;

export function getMySubmissions(signal?: AbortSignal): Promise<{ data: MySubmission[] }> {
  return api.get<{ data: MySubmission[] }>('/api/reviews/mine', { signal });
}

export function getMySubmissionsQueryOptions() {
  return queryOptions({ queryKey: [...submissionsQueryKey, 'mine'] as const, queryFn: ({ signal }) => getMySubmissions(signal) });
}

export function useMySubmissions() {
  return useQuery(getMySubmissionsQueryOptions());
}
