import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { AuthResponse, RegisterInput } from '@shared/schemas/auth';
import { api } from '@/lib/api';
import { storeSignedInUser } from './login';

export function register(input: RegisterInput): Promise<AuthResponse> {
  return api.post<AuthResponse>('/api/auth/register', input);
}

export function useRegister() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: register,
    onSuccess: (result) => storeSignedInUser(queryClient, result),
  });
}
