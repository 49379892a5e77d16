import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SourceResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { sourcesQueryKey } from './get-sources';

export function reopenSource(id: string): Promise<SourceResponse> {
  return api.post<SourceResponse>(`/api/sources/${encodeURIComponent(id)}/reopen`, {});
}

export function useReopenSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reopenSource,
    // The source, its excerpts and the lists all change state.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: sourcesQueryKey }),
        queryClient.invalidateQueries({ queryKey: ['excerpts'] }),
      ]),
  });
}
