import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import type { AuthResponse, LoginInput, SessionResponse } from '@shared/schemas/auth';
import { api } from '@/lib/api';
import { sessionQueryKey } from './get-session';

export function login(input: LoginInput): Promise<AuthResponse> {
  return api.post<AuthResponse>('/api/auth/login', input);
}

/** Put the newly signed-in user into the session cache and drop data fetched as someone else. */
export function storeSignedInUser(queryClient: QueryClient, result: AuthResponse): void {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionQueryKey[0] });
  queryClient.setQueryData<SessionResponse>(sessionQueryKey, (previous) => ({
    demo: previous?.demo ?? false,
    mailCapture: previous?.mailCapture ?? false,
    user: result.user,
    csrfToken: result.csrfToken,
  }));
  void queryClient.invalidateQueries({ queryKey: sessionQueryKey });
}

export function useLogin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: login,
    onSuccess: (result) => storeSignedInUser(queryClient, result),
  });
}
