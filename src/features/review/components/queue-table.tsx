import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { QueueRow } from '@shared/review/types';
import { sourceTypeLabels } from '@shared/catalogue/vocabulary';
import { formatDate } from '@/lib/format';

const column = createColumnHelper<QueueRow>();

/** The queue as a table; sorting and paging happen on the server (oldest first by default). */
export function QueueTable({ rows, caption }: { rows: QueueRow[]; caption: string }) {
  const columns = useMemo(
    () => [
      column.accessor('title', {
        header: 'Submission',
        cell: (info) => {
          const row = info.row.original;
          return (
            <div>
              <span className="label-caps mr-2 text-ink-muted">{row.kind === 'source' ? 'Source' : 'Excerpt'}</span>
              <Link to={`/review/${row.kind}/${row.id}`} className="font-medium">{row.title}</Link>
              {row.resubmitted && <span className="label-caps ml-2 text-caution">↻ resubmitted</span>}
              {row.submittedExcerpts ? <p className="text-sm text-ink-muted">with {row.submittedExcerpts} excerpt{row.submittedExcerpts === 1 ? '' : 's'} awaiting review</p> : null}
            </div>
          );
        },
      }),
      column.accessor((r) => sourceTypeLabels[r.source.sourceType], { id: 'type', header: 'Type' }),
      column.accessor((r) => r.languages.join(', '), { id: 'languages', header: 'Languages' }),
      column.accessor((r) => r.contributor?.displayName ?? '—', { id: 'contributor', header: 'Contributor' }),
      column.accessor('version', { header: 'Version', cell: (info) => <span className="figures">v{info.getValue()}</span> }),
      column.accessor('waitingSince', {
        header: 'Waiting',
        cell: (info) => (
          <span className="figures whitespace-nowrap">
            {info.row.original.ageDays} d <span className="text-ink-muted">(since {formatDate(info.getValue())})</span>
          </span>
        ),
      }),
    ],
    [],
  );
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => `${r.kind}-${r.id}`, manualPagination: true, manualSorting: true });
  return (
    <div role="region" aria-label={caption} tabIndex={0} className="overflow-x-auto rounded-soft border border-rule bg-paper-raised">
      <table className="w-full border-collapse text-left text-[0.9375rem]">
        <caption className="sr-only">{caption}</caption>
        <thead className="bg-paper-sunk">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => (
                <th key={header.id} scope="col" className="border-b border-rule px-3 py-2 text-sm font-semibold">
                  {flexRender(header.column.columnDef.header, header.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-rule align-top last:border-0">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
