import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Role, SessionResponse } from '@shared/schemas/auth';
import { api } from '@/lib/api';

export const sessionQueryKey = ['session'] as const;

export function getSession(): Promise<SessionResponse> {
  return api.get<SessionResponse>('/api/auth/me');
}

export function getSessionQueryOptions() {
  return queryOptions({
    queryKey: sessionQueryKey,
    queryFn: getSession,
    staleTime: 5 * 60_000,
    refetchOnWindowFocus: true,
  });
}

/** Who is signed in (or null), the CSRF token, and whether this is a demo installation. */
export function useSession() {
  const query = useQuery(getSessionQueryOptions());
  const user = query.data?.user ?? null;
  return {
    ...query,
    user,
    role: user?.role ?? null,
    demo: query.data?.demo ?? false,
    mailCapture: query.data?.mailCapture ?? false,
  };
}

/** Whether a role is among those allowed; anonymous (null) never is. */
export function hasRole(role: Role | null | undefined, allowed: readonly Role[]): boolean {
  return role != null && allowed.includes(role);
}
