import { useMutation } from '@tanstack/react-query';
import type { PasswordResetConfirmInput } from '@shared/schemas/auth';
import { api } from '@/lib/api';

export function confirmPasswordReset(input: PasswordResetConfirmInput): Promise<void> {
  return api.post<void>('/api/auth/password-reset/confirm', input);
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
