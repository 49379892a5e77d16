import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EntityKind, VersionDiff } from '@shared/review/types';
import { api } from '@/lib/api';
import { historyQueryKey } from './get-history';

export function getVersionDiff(kind: EntityKind, id: string, from: number | undefined, to: number | undefined, signal?: AbortSignal) {
  return api.get<{ data: VersionDiff }>(`/api/history/${kind}/${encodeURIComponent(id)}/diff`, { params: { from, to }, signal });
}

export function getVersionDiffQueryOptions(kind: EntityKind, id: string, from?: number, to?: number) {
  return queryOptions({
    queryKey: [...historyQueryKey, kind, id, 'diff', from ?? null, to ?? null] as const,
    queryFn: ({ signal }) => getVersionDiff(kind, id, from, to, signal),
  });
}

export function useVersionDiff(kind: EntityKind, id: string, from?: number, to?: number, enabled = true) {
  return useQuery({ ...getVersionDiffQueryOptions(kind, id, from, to), enabled });
}
