import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SubmitSourceResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { sourcesQueryKey } from './get-sources';

export function submitSource(id: string): Promise<SubmitSourceResponse> {
  return api.post<SubmitSourceResponse>(`/api/sources/${encodeURIComponent(id)}/submit`, {});
}

export function useSubmitSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: submitSource,
    // The source, its excerpts and the lists all change state.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: sourcesQueryKey }),
        queryClient.invalidateQueries({ queryKey: ['excerpts'] }),
      ]),
  });
}
