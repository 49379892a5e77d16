import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EntityKind, ReviewDetail } from '@shared/review/types';
import { api } from '@/lib/api';
import { reviewsQueryKey } from './get-review-queue';

export const reviewQueryKey = (kind: EntityKind, id: string) => [...reviewsQueryKey, 'detail', kind, id] as const;

export function getReview(kind: EntityKind, id: string, signal?: AbortSignal): Promise<{ data: ReviewDetail }> {
  return api.get<{ data: ReviewDetail }>(`/api/reviews/${kind}/${encodeURIComponent(id)}`, { signal });
}

export function getReviewQueryOptions(kind: EntityKind, id: string) {
  return queryOptions({ queryKey: reviewQueryKey(kind, id), queryFn: ({ signal }) => getReview(kind, id, signal) });
}

export function useReview(kind: EntityKind, id: string) {
  return useQuery(getReviewQueryOptions(kind, id));
}
