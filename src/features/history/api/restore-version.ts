import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EntityKind } from '@shared/review/types';
import type { RestoreInput } from '@shared/review/schemas';
import { api } from '@/lib/api';
import { historyQueryKey } from './get-history';

export interface RestoreResponse {
  data: { kind: EntityKind; id: string; version: number; status: string; approvedVersion: number | null };
}

export function restoreVersion(kind: EntityKind, id: string, input: RestoreInput): Promise<RestoreResponse> {
  return api.post<RestoreResponse>(`/api/history/${kind}/${encodeURIComponent(id)}/restore`, input);
}

export function useRestoreVersion(kind: EntityKind, id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: RestoreInput) => restoreVersion(kind, id, input),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: [...historyQueryKey, kind, id] }),
  });
}
