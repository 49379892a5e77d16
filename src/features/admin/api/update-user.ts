import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser, UpdateUserInput } from '@shared/schemas/auth';
import { api } from '@/lib/api';
import { usersQueryKey, type UsersPage } from './get-users';

export function updateUser(id: number, changes: UpdateUserInput): Promise<{ data: PublicUser }> {
  return api.patch<{ data: PublicUser }>(`/api/users/${id}`, changes);
}

/** Changes a user's role or active flag, then updates every cached page of users that shows them. */
export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: number; changes: UpdateUserInput }) => updateUser(id, changes),
    onSuccess: ({ data: updated }) => {
      queryClient.setQueriesData<UsersPage>({ queryKey: usersQueryKey }, (page) =>
        page ? { ...page, data: page.data.map((u) => (u.id === updated.id ? updated : u)) } : page,
      );
      // A filter by role or a sort may now place the user elsewhere.
      void queryClient.invalidateQueries({ queryKey: usersQueryKey });
    },
  });
}
