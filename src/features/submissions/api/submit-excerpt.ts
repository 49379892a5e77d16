import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api';
import { submissionsQueryKey } from './get-my-submissions';

export interface SubmitExcerptResponse {
  data: { id: string; status: string; version: number };
}

/** Sends a fixed (returned) excerpt back to review. */
export function submitExcerpt(input: { id: string; version?: number; reason?: string }): Promise<SubmitExcerptResponse> {
  return api.post<SubmitExcerptResponse>(`/api/excerpts/${encodeURIComponent(input.id)}/submit`, { version: input.version, reason: input.reason });
}

export function useSubmitExcerpt() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: submitExcerpt, onSuccess: () => void queryClient.invalidateQueries({ queryKey: submissionsQueryKey }) });
}
