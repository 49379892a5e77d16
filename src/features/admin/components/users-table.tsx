import { useMemo } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type OnChangeFn,
  type SortingState,
} from '@tanstack/react-table';
import { roles, type PublicUser, type UpdateUserInput } from '@shared/schemas/auth';
import { Checkbox } from '@/components/checkbox';
import { Select } from '@/components/select';
import { Spinner } from '@/components/spinner';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import { roleLabels } from '@/lib/roles';

export interface UsersTableProps {
  users: PublicUser[];
  /** Server-side sorting, at most one column. */
  sorting: SortingState;
  onSortingChange: OnChangeFn<SortingState>;
  onUpdate: (user: PublicUser, changes: UpdateUserInput) => void;
  /** The signed-in admin: their own role and active flag are not editable here. */
  currentUserId?: number;
  /** The user whose change is being saved. */
  savingUserId?: number;
  /** The table's caption, for screen readers and context. */
  caption: string;
}

const roleOptions = roles.map((r) => ({ value: r, label: roleLabels[r] }));
const column = createColumnHelper<PublicUser>();

export function UsersTable({ users, sorting, onSortingChange, onUpdate, currentUserId, savingUserId, caption }: UsersTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('displayName', {
        header: 'Name',
        cell: (info) => (
          <span className="font-medium">
            {info.getValue()}
            {info.row.original.id === currentUserId && <span className="ml-1 text-ink-muted">(you)</span>}
          </span>
        ),
      }),
      column.accessor('email', { header: 'E-mail', cell: (info) => <span className="break-all">{info.getValue()}</span> }),
      column.accessor('role', {
        header: 'Role',
        cell: (info) => {
          const user = info.row.original;
          return (
            <Select
              label={`Role of ${user.displayName}`}
              hideLabel
              value={user.role}
              options={roleOptions}
              disabled={user.id === currentUserId || user.id === savingUserId}
              onChange={(event) => onUpdate(user, { role: event.target.value as PublicUser['role'] })}
              className="min-h-0 min-w-[9rem] py-1 text-sm"
            />
          );
        },
      }),
      column.accessor('active', {
        header: 'Active',
        enableSorting: false,
        cell: (info) => {
          const user = info.row.original;
          return (
            <div className="flex items-center gap-2">
              <Checkbox
                label={`${user.displayName} may sign in`}
                hideLabel
                checked={user.active}
                disabled={user.id === currentUserId || user.id === savingUserId}
                onChange={(event) => onUpdate(user, { active: event.target.checked })}
              />
              <span className="text-sm text-ink-muted" aria-hidden="true">
                {user.active ? 'Active' : 'Deactivated'}
              </span>
              {user.id === savingUserId && <Spinner size="sm" label={`Saving ${user.displayName}`} />}
            </div>
          );
        },
      }),
      column.accessor('createdAt', {
        header: 'Created',
        cell: (info) => <span className="figures whitespace-nowrap">{formatDate(info.getValue())}</span>,
      }),
    ],
    [currentUserId, savingUserId, onUpdate],
  );

  const table = useReactTable({
    data: users,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (user) => String(user.id),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange,
  });

  return (
    <div role="region" aria-label={caption} tabIndex={0} className="overflow-x-auto rounded-soft border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-[0.9375rem]">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const canSort = header.column.getCanSort();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className="border-b border-rule px-3 py-2 text-sm font-semibold text-ink"
                  >
                    {canSort ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={cn('inline-flex items-center gap-1 hover:text-accent-strong', sorted && 'text-accent-strong')}
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="w-3 text-xs">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={cn('border-b border-rule last:border-0', !row.original.active && 'text-ink-muted')}>
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-middle">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
