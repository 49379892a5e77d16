import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EntityKind, VersionSnapshot } from '@shared/review/types';
import { api } from '@/lib/api';
import { historyQueryKey } from './get-history';

export function getVersion(kind: EntityKind, id: string, version: number, signal?: AbortSignal) {
  return api.get<{ data: VersionSnapshot }>(`/api/history/${kind}/${encodeURIComponent(id)}/v/${version}`, { signal });
}

export function getVersionQueryOptions(kind: EntityKind, id: string, version: number) {
  return queryOptions({
    queryKey: [...historyQueryKey, kind, id, 'version', version] as const,
    queryFn: ({ signal }) => getVersion(kind, id, version, signal),
    staleTime: Infinity,
  });
}

/** One version, as its permalink shows it; versions never change, so it is never refetched. */
export function useVersion(kind: EntityKind, id: string, version: number) {
  return useQuery(getVersionQueryOptions(kind, id, version));
}
