import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CitationStyle, CiteFormat, CiteResponse } from '@shared/citations/api';
import { api, buildUrl } from '@/lib/api';

export type CiteTarget = { kind: 'excerpt' | 'source'; id: string };

export const stylesQueryOptions = queryOptions({
  queryKey: ['cite', 'styles'] as const,
  queryFn: ({ signal }) => api.get<{ data: CitationStyle[] }>('/api/cite/styles', { signal }).then((r) => r.data),
  staleTime: 60 * 60 * 1000,
});

export function useCitationStyles() {
  return useQuery(stylesQueryOptions);
}

export function citePath(target: CiteTarget): string {
  return `/api/${target.kind}s/${encodeURIComponent(target.id)}/cite`;
}

/** The export itself, as a file (the server adds Content-Disposition). */
export function citeDownloadUrl(target: CiteTarget, format: CiteFormat, style: string, version?: number): string {
  return buildUrl(citePath(target), { format, style, version, download: 1 });
}

export function useCitation(target: CiteTarget, format: CiteFormat, style: string, version?: number) {
  return useQuery({
    queryKey: ['cite', target.kind, target.id, format, style, version ?? null] as const,
    queryFn: ({ signal }) => api.get<CiteResponse>(citePath(target), { params: { format, style, version }, signal }),
    staleTime: 5 * 60 * 1000,
  });
}

export function citeMany(ids: string[], format: CiteFormat, style: string): Promise<CiteResponse> {
  return api.post<CiteResponse>('/api/cite', { ids, format, style });
}
