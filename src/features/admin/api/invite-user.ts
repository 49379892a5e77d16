import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '@shared/schemas/auth';
import type { InviteUserInput } from '@shared/schemas/users';
import { api } from '@/lib/api';
import { usersQueryKey } from './get-users';

export function inviteUser(input: InviteUserInput): Promise<{ data: PublicUser }> {
  return api.post<{ data: PublicUser }>('/api/users/invitations', input);
}

/** Invites someone with a role (they get an e-mail to choose a password); the users table refreshes. */
export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteUser,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}
