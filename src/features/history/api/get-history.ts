import { queryOptions, useQuery } from '@tanstack/react-query';
import type { EntityKind, RevisionSummary } from '@shared/review/types';
import type { WorkflowState } from '@shared/catalogue/vocabulary';
import { api } from '@/lib/api';

export const historyQueryKey = ['history'] as const;

export interface HistoryResponse {
  data: RevisionSummary[];
  item: { kind: EntityKind; id: string; title: string; status: WorkflowState; version: number; approvedVersion: number | null };
  abilities: { restore: boolean; seesAllVersions: boolean };
}

export function getHistory(kind: EntityKind, id: string, signal?: AbortSignal): Promise<HistoryResponse> {
  return api.get<HistoryResponse>(`/api/history/${kind}/${encodeURIComponent(id)}`, { signal });
}

export function getHistoryQueryOptions(kind: EntityKind, id: string) {
  return queryOptions({ queryKey: [...historyQueryKey, kind, id, 'list'] as const, queryFn: ({ signal }) => getHistory(kind, id, signal) });
}

export function useHistory(kind: EntityKind, id: string) {
  return useQuery(getHistoryQueryOptions(kind, id));
}
