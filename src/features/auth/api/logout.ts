import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import type { SessionResponse } from '@shared/schemas/auth';
import { api, clearCsrfToken } from '@/lib/api';
import { sessionQueryKey } from './get-session';

export function logout(): Promise<void> {
  return api.post<void>('/api/auth/logout');
}

/**
 * Signs out, goes to the home page, then forgets the user's data. Navigating first
 * keeps a guarded page (e.g. Account) from bouncing to sign-in on the way out.
 */
export function useLogout({ redirectTo = '/' }: { redirectTo?: string } = {}) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: logout,
    onSuccess: async () => {
      // The server starts a new session; its token comes with the next /me.
      clearCsrfToken();
      await navigate(redirectTo, { replace: true });
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionQueryKey[0] });
      queryClient.setQueryData<SessionResponse>(sessionQueryKey, (previous) =>
        previous ? { ...previous, user: null } : previous,
      );
      await queryClient.invalidateQueries({ queryKey: sessionQueryKey });
    },
  });
}
