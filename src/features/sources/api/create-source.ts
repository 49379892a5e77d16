import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SourceFields } from '@shared/catalogue/schemas';
import type { SourceResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { sourceQueryKey } from './get-source';
import { sourcesQueryKey } from './get-sources';

export function createSource(input: SourceFields): Promise<SourceResponse> {
  return api.post<SourceResponse>('/api/sources', input);
}

export function useCreateSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSource,
    onSuccess: (result) => {
      queryClient.setQueryData(sourceQueryKey(result.data.id), result);
      void queryClient.invalidateQueries({ queryKey: [...sourcesQueryKey, 'list'] });
    },
  });
}
