import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EntityKind, ReviewDetail } from '@shared/review/types';
import { api } from '@/lib/api';
import { submissionsQueryKey } from './get-my-submissions';

/** One submission with the editors' comments (the review page's data, read as its contributor). */
export function getSubmission(kind: EntityKind, id: string, signal?: AbortSignal): Promise<{ data: ReviewDetail }> {
  return api.get<{ data: ReviewDetail }>(`/api/reviews/${kind}/${encodeURIComponent(id)}`, { signal });
}

export function getSubmissionQueryOptions(kind: EntityKind, id: string) {
  return queryOptions({ queryKey: [...submissionsQueryKey, 'detail', kind, id] as const, queryFn: ({ signal }) => getSubmission(kind, id, signal) });
}

export function useSubmission(kind: EntityKind, id: string) {
  return useQuery(getSubmissionQueryOptions(kind, id));
}
