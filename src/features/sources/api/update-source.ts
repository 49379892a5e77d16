import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SourceFields } from '@shared/catalogue/schemas';
import type { SourceResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { sourceQueryKey } from './get-source';
import { sourcesQueryKey } from './get-sources';

export interface UpdateSourceInput {
  id: string;
  /** The version the edit was based on; a stale one is answered with 409 `conflict`. */
  version: number;
  changes: Partial<SourceFields>;
  reason?: string;
  /** Editors: keep approved material approved, publishing this change without a new review. */
  publish?: true;
}

export function updateSource({ id, version, changes, reason, publish }: UpdateSourceInput): Promise<SourceResponse> {
  return api.patch<SourceResponse>(`/api/sources/${encodeURIComponent(id)}`, { ...changes, version, reason, publish });
}

export function useUpdateSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSource,
    onSuccess: (result) => {
      queryClient.setQueryData(sourceQueryKey(result.data.id), result);
      void queryClient.invalidateQueries({ queryKey: [...sourcesQueryKey, 'list'] });
    },
  });
}
