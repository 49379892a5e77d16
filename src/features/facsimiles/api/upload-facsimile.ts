import { useState } from 'react';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { FacsimileUploadResponse } from '@shared/catalogue/types';
import { api } from '@/lib/api';
import { facsimileQueryKey } from './get-facsimile';

export interface UploadFacsimileInput {
  sourceId: string;
  file: File;
  /** The uploader confirms they may share the file under the source's rights statement. */
  rightsConfirmed: boolean;
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

export function uploadFacsimile({ sourceId, file, rightsConfirmed, onProgress, signal }: UploadFacsimileInput) {
  const form = new FormData();
  form.append('rightsConfirmed', String(rightsConfirmed));
  form.append('file', file);
  return api.upload<FacsimileUploadResponse>(`/api/sources/${encodeURIComponent(sourceId)}/facsimiles`, form, {
    onProgress: ({ fraction }) => onProgress?.(fraction),
    signal,
  });
}

/** The upload mutation, with the share of bytes sent so far (null before the first progress event). */
export function useUploadFacsimile() {
  const queryClient = useQueryClient();
  const [progress, setProgress] = useState<number | null>(null);
  const mutation = useMutation({
    mutationFn: (input: Omit<UploadFacsimileInput, 'onProgress'>) => {
      setProgress(0);
      return uploadFacsimile({ ...input, onProgress: setProgress });
    },
    onSuccess: (result, { sourceId }) => {
      queryClient.setQueryData(facsimileQueryKey(result.data.id), { data: result.data });
      void queryClient.invalidateQueries({ queryKey: ['sources', 'detail', sourceId] });
    },
    onSettled: () => setProgress(null),
  });
  return { ...mutation, progress };
}
