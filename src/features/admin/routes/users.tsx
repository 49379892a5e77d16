import { useCallback, useState } from 'react';
import type { SortingState, Updater } from '@tanstack/react-table';
import { roles, type PublicUser, type Role, type UpdateUserInput } from '@shared/schemas/auth';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { Pagination } from '@/components/pagination';
import { PageSpinner } from '@/components/spinner';
import { useSession } from '@/features/auth/api/get-session';
import { useQueryParams } from '@/lib/use-query-params';
import { errorMessage } from '@/lib/api';
import { roleLabels } from '@/lib/roles';
import { useUsers, type UserSortField } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { UserFilters } from '../components/user-filters';
import { UsersTable } from '../components/users-table';
import { InviteForm } from '../components/invite-form';
import { Card } from '@/components/card';

const perPage = 25;
const sortFields: readonly UserSortField[] = ['displayName', 'email', 'role', 'createdAt'];

function parseSort(value: string | null): SortingState {
  if (!value) return [{ id: 'createdAt', desc: true }];
  const desc = value.startsWith('-');
  const id = desc ? value.slice(1) : value;
  return (sortFields as readonly string[]).includes(id) ? [{ id, desc }] : [{ id: 'createdAt', desc: true }];
}

function formatSort(sorting: SortingState): string | undefined {
  const first = sorting[0];
  return first ? `${first.desc ? '-' : ''}${first.id}` : undefined;
}

function describeChange(user: PublicUser, changes: UpdateUserInput): string {
  if (changes.role) return `${user.displayName} is now ${roleLabels[changes.role].toLowerCase()}.`;
  return changes.active ? `${user.displayName} can sign in again.` : `${user.displayName} has been deactivated.`;
}

export function Component() {
  const [params, setQuery] = useQueryParams();
  const page = Math.max(1, Number.parseInt(params.get('page') ?? '1', 10) || 1);
  const sorting = parseSort(params.get('sort'));
  const q = params.get('q') ?? '';
  const roleParam = params.get('role') ?? '';
  const role = (roles as readonly string[]).includes(roleParam) ? (roleParam as Role) : '';

  const { user: me } = useSession();
  const users = useUsers({ page, perPage, sort: formatSort(sorting), q: q || undefined, role: role || undefined });
  const update = useUpdateUser();
  const [notice, setNotice] = useState('');

  const onSortingChange = (updater: Updater<SortingState>) => {
    const next = typeof updater === 'function' ? updater(sorting) : updater;
    setQuery({ sort: formatSort(next), page: undefined });
  };

  const onUpdate = useCallback(
    (user: PublicUser, changes: UpdateUserInput) => {
      setNotice('');
      update.mutate({ id: user.id, changes }, { onSuccess: () => setNotice(describeChange(user, changes)) });
    },
    [update.mutate],
  );

  return (
    <>
      <PageHeader eyebrow="Admin" title="Users" description="Invite contributors and editors, change roles, and deactivate accounts that should no longer sign in." />
      <Card className="mb-6">
        <InviteForm />
      </Card>
      <UserFilters q={q} role={role} onChange={(f) => setQuery({ q: f.q || undefined, role: f.role || undefined, page: undefined })} />

      <div aria-live="polite" className="mb-3 min-h-6 text-sm">
        {notice && <span className="text-accent-strong">✓ {notice}</span>}
      </div>
      {update.isError && (
        <Alert tone="danger" title="The change was not saved" className="mb-4">
          {errorMessage(update.error)}
        </Alert>
      )}

      {users.isPending ? (
        <PageSpinner label="Loading users…" />
      ) : users.isError ? (
        <Alert
          tone="danger"
          title="Users could not be loaded"
          action={
            <Button variant="secondary" onClick={() => void users.refetch()}>
              Try again
            </Button>
          }
        >
          {errorMessage(users.error)}
        </Alert>
      ) : users.data.data.length === 0 ? (
        <EmptyState title="No users match">
          {q || role ? 'Try another name, or show all roles.' : 'Nobody has registered yet.'}
        </EmptyState>
      ) : (
        <div aria-busy={users.isFetching || undefined}>
          <UsersTable
            caption={`Users, page ${users.data.page}`}
            users={users.data.data}
            sorting={sorting}
            onSortingChange={onSortingChange}
            onUpdate={onUpdate}
            currentUserId={me?.id}
            savingUserId={update.isPending ? update.variables?.id : undefined}
          />
          <Pagination
            label="Users pages"
            noun="users"
            page={users.data.page}
            perPage={users.data.perPage}
            total={users.data.total}
            disabled={users.isFetching}
            onPageChange={(p) => setQuery({ page: p > 1 ? String(p) : undefined })}
          />
        </div>
      )}
    </>
  );
}
