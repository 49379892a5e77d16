import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ExportFormat, ProgrammeInput } from '@shared/programmes/schema';
import type { ProgrammePreview, ProgrammeSummary, ProgrammeView } from '@shared/programmes/types';
import { api, buildUrl } from '@/lib/api';

export const programmesKey = ['programmes'] as const;

export const programmesQueryOptions = queryOptions({
  queryKey: [...programmesKey, 'list'] as const,
  queryFn: ({ signal }) => api.get<{ data: ProgrammeSummary[] }>('/api/programmes', { signal }).then((r) => r.data),
});

export const programmeQueryOptions = (id: string) =>
  queryOptions({
    queryKey: [...programmesKey, 'one', id] as const,
    queryFn: ({ signal }) => api.get<{ data: ProgrammeView }>(`/api/programmes/${id}`, { signal }).then((r) => r.data),
  });

export const sharedProgrammeQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['shared-programme', token] as const,
    queryFn: ({ signal }) => api.get<{ data: ProgrammeView }>(`/api/shared-programmes/${token}`, { signal }).then((r) => r.data),
  });

export const sharedPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['shared-programme', token, 'preview'] as const,
    queryFn: ({ signal }) => api.get<{ data: ProgrammePreview }>(`/api/shared-programmes/${token}/preview`, { signal }).then((r) => r.data),
  });

export const usePrograms = () => useQuery(programmesQueryOptions);
export const useProgramme = (id: string) => useQuery(programmeQueryOptions(id));

export function getProgramme(id: string) {
  return api.get<{ data: ProgrammeView }>(`/api/programmes/${id}`).then((r) => r.data);
}

export function updateProgramme(id: string, changes: Partial<ProgrammeInput> & { version: number }) {
  return api.patch<{ data: ProgrammeView }>(`/api/programmes/${id}`, changes).then((r) => r.data);
}

/** Live preview of notes (also before saving): footnotes, bibliography, problems. */
export function previewNotes(notesMarkdown: string, citationStyle: string, signal?: AbortSignal) {
  return api.post<{ data: ProgrammePreview }>('/api/programmes/preview', { notesMarkdown, citationStyle }, { signal }).then((r) => r.data);
}

export function exportUrl(id: string, format: ExportFormat) {
  return buildUrl(`/api/programmes/${id}/export`, { format });
}
export function sharedExportUrl(token: string, format: ExportFormat) {
  return buildUrl(`/api/shared-programmes/${token}/export`, { format });
}

function useProgrammeMutation<A>(fn: (arg: A) => Promise<ProgrammeView | void>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (data) => {
      if (data) queryClient.setQueryData(programmeQueryOptions(data.id).queryKey, data);
      void queryClient.invalidateQueries({ queryKey: [...programmesKey, 'list'] });
    },
  });
}

export const useCreateProgramme = () =>
  useProgrammeMutation((input: ProgrammeInput) => api.post<{ data: ProgrammeView }>('/api/programmes', input).then((r) => r.data));
export const useUpdateProgramme = (id: string) =>
  useProgrammeMutation((changes: Partial<ProgrammeInput> & { version: number }) => updateProgramme(id, changes));
export const useShareProgramme = (id: string) =>
  useProgrammeMutation((on: boolean) =>
    (on ? api.post<{ data: ProgrammeView }>(`/api/programmes/${id}/share`) : api.delete<{ data: ProgrammeView }>(`/api/programmes/${id}/share`)).then((r) => r.data),
  );
export const useDeleteProgramme = () => useProgrammeMutation((id: string) => api.delete(`/api/programmes/${id}`));
