import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { QueueResponse } from '@shared/review/types';
import { api } from '@/lib/api';

export const reviewsQueryKey = ['reviews'] as const;

export interface ReviewQueueQuery {
  kind?: 'source' | 'excerpt';
  sourceType?: string;
  contributor?: string;
  minAgeDays?: number;
  lang?: string;
  sort?: 'oldest' | 'newest';
  page: number;
  perPage: number;
}

export function getReviewQueue(query: ReviewQueueQuery, signal?: AbortSignal): Promise<QueueResponse> {
  return api.get<QueueResponse>('/api/reviews', { params: { ...query }, signal });
}

export function getReviewQueueQueryOptions(query: ReviewQueueQuery) {
  return queryOptions({
    queryKey: [...reviewsQueryKey, 'queue', query] as const,
    queryFn: ({ signal }) => getReviewQueue(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useReviewQueue(query: ReviewQueueQuery) {
  return useQuery(getReviewQueueQueryOptions(query));
}
