import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ConcordancePatch } from '@shared/review/schemas';
import type { ConcordanceChangeResult } from '@shared/review/types';
import { api } from '@/lib/api';
import { concordanceQueryKey } from './get-concordance';

export function updateConcordance(patch: ConcordancePatch): Promise<{ data: ConcordanceChangeResult }> {
  return api.patch<{ data: ConcordanceChangeResult }>('/api/concordance', patch);
}

export function useUpdateConcordance() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateConcordance, onSuccess: () => void queryClient.invalidateQueries({ queryKey: concordanceQueryKey }) });
}
