import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DecisionInput } from '@shared/review/schemas';
import type { ReviewRecord } from '@shared/review/types';
import { api } from '@/lib/api';
import { reviewsQueryKey } from './get-review-queue';

export interface DecisionResponse {
  data: ReviewRecord;
  item: { kind: string; id: string; status: string; version: number; approvedVersion: number | null };
  alsoApproved: string[];
}

export function decideReview(input: DecisionInput): Promise<DecisionResponse> {
  return api.post<DecisionResponse>('/api/reviews', input);
}

/** Records a decision, then refreshes the queue and every review page. */
export function useDecideReview() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decideReview,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: reviewsQueryKey }),
  });
}
