import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type OnChangeFn,
  type SortingState,
} from '@tanstack/react-table';
import type { SourceSummary } from '@shared/catalogue/types';
import { sourceTypeLabels } from '@shared/catalogue/vocabulary';
import { cn } from '@/lib/cn';
import { formatDate } from '@/lib/format';
import { StatusBadge } from './status-badge';

export interface SourcesTableProps {
  sources: SourceSummary[];
  sorting: SortingState;
  onSortingChange: OnChangeFn<SortingState>;
  showStatus: boolean;
  caption: string;
}

const column = createColumnHelper<SourceSummary>();

function creatorsLine(source: SourceSummary): string {
  return source.creators.map((c) => c.name).join('; ');
}

/** Server-sorted list of sources; column ids are the API's sort fields (title, date, updatedAt). */
export function SourcesTable({ sources, sorting, onSortingChange, showStatus, caption }: SourcesTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('title', {
        header: 'Title',
        cell: (info) => {
          const source = info.row.original;
          return (
            <div className="min-w-[16rem]">
              <Link to={`/sources/${source.id}`} className="font-serif text-[1.0625rem] leading-snug">
                {source.title}
              </Link>
              {source.creators.length > 0 && <p className="text-sm text-ink-muted">{creatorsLine(source)}</p>}
            </div>
          );
        },
      }),
      column.accessor((s) => s.date.label, {
        id: 'date',
        header: 'Date',
        cell: (info) => <span className="figures whitespace-nowrap">{info.getValue()}</span>,
      }),
      column.accessor('sourceType', {
        header: 'Kind',
        enableSorting: false,
        cell: (info) => sourceTypeLabels[info.getValue()],
      }),
      column.accessor((s) => s.languages.join(', '), {
        id: 'languages',
        header: 'Languages',
        enableSorting: false,
        cell: (info) => <span className="uppercase tracking-wide text-sm">{info.getValue()}</span>,
      }),
      column.accessor((s) => [s.holdingInstitution, s.shelfmark].filter(Boolean).join(', '), {
        id: 'holding',
        header: 'Held at',
        enableSorting: false,
        cell: (info) => <span className="text-sm">{info.getValue() || '—'}</span>,
      }),
      ...(showStatus
        ? [
            column.accessor('status', {
              header: 'State',
              enableSorting: false,
              cell: (info) => <StatusBadge status={info.getValue()} />,
            }),
          ]
        : []),
      column.accessor('updatedAt', {
        header: 'Updated',
        cell: (info) => <span className="figures whitespace-nowrap text-sm text-ink-muted">{formatDate(info.getValue())}</span>,
      }),
    ],
    [showStatus],
  );

  const table = useReactTable({
    data: sources,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (source) => source.id,
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
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}
                    className="border-b border-rule px-3 py-2 text-sm font-semibold text-ink"
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className={cn('inline-flex items-center gap-1 hover:text-accent-strong', sorted && 'text-accent-strong')}
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="w-3 text-xs">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
                        <span className="sr-only">{sorted ? '' : ', sortable'}</span>
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
            <tr key={row.id} className="border-b border-rule align-top last:border-0 hover:bg-paper">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2.5">
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
