import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { PublicUser, Role } from '@shared/schemas/auth';
import { api } from '@/lib/api';

export type UserSortField = 'displayName' | 'email' | 'role' | 'createdAt';

export interface UsersQuery {
  page: number;
  perPage: number;
  /** A field name, ascending; prefixed with "-" for descending, e.g. "-createdAt". */
  sort?: string;
  q?: string;
  role?: Role;
}

export interface UsersPage {
  data: PublicUser[];
  total: number;
  page: number;
  perPage: number;
}

export const usersQueryKey = ['users'] as const;

export function getUsers(query: UsersQuery, signal?: AbortSignal): Promise<UsersPage> {
  return api.get<UsersPage>('/api/users', { params: { ...query }, signal });
}

export function getUsersQueryOptions(query: UsersQuery) {
  return queryOptions({
    queryKey: [...usersQueryKey, 'list', query] as const,
    queryFn: ({ signal }) => getUsers(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useUsers(query: UsersQuery) {
  return useQuery(getUsersQueryOptions(query));
}
