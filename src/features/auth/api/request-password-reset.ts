import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequestInput } from '@shared/schemas/auth';
import { api } from '@/lib/api';

/** Always answered with 202, whether or not the address has an account. */
export function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  return api.post<void>('/api/auth/password-reset', input);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
