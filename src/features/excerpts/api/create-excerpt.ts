import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ExcerptFields } from '@shared/catalogue/schemas';
import type { ExcerptResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { excerptQueryKey } from './get-excerpt';

export interface CreateExcerptInput {
  sourceId: string;
  fields: ExcerptFields;
}

export function createExcerpt({ sourceId, fields }: CreateExcerptInput): Promise<ExcerptResponse> {
  return api.post<ExcerptResponse>(`/api/sources/${encodeURIComponent(sourceId)}/excerpts`, fields);
}

export function useCreateExcerpt() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createExcerpt,
    onSuccess: (result, { sourceId }) => {
      if (result.abilities) queryClient.setQueryData(excerptQueryKey(result.data.id), result);
      // The source page lists its excerpts.
      void queryClient.invalidateQueries({ queryKey: ['sources', 'detail', sourceId] });
    },
  });
}
