import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ExcerptFields } from '@shared/catalogue/schemas';
import type { ExcerptResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { excerptQueryKey } from './get-excerpt';

export interface UpdateExcerptInput {
  id: string;
  /** The version the edit was based on; a stale one is answered with 409 `conflict`. */
  version: number;
  changes: Partial<ExcerptFields>;
  reason?: string;
  /** Editors: keep approved material approved, publishing this change without a new review. */
  publish?: true;
}

export function updateExcerpt({ id, version, changes, reason, publish }: UpdateExcerptInput): Promise<ExcerptResponse> {
  return api.patch<ExcerptResponse>(`/api/excerpts/${encodeURIComponent(id)}`, { ...changes, version, reason, publish });
}

export function useUpdateExcerpt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateExcerpt,
    onSuccess: (result) => {
      queryClient.setQueryData(excerptQueryKey(result.data.id), result);
      void queryClient.invalidateQueries({ queryKey: ['sources', 'detail', result.data.source.id] });
    },
  });
}
