import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface Column<T> {
  header: string;
  cell: (row: T) => ReactNode;
  numeric?: boolean;
  /** The row header (th scope=row); one column should have it. */
  rowHeader?: boolean;
}

/** A plain, scrollable, accessible table for a chart's data. */
export function DataTable<T>({ caption, columns, rows, rowKey }: { caption: string; columns: Column<T>[]; rows: readonly T[]; rowKey: (row: T, index: number) => string }) {
  return (
    <div className="max-h-96 overflow-auto rounded-soft border border-rule" tabIndex={0} role="region" aria-label={caption}>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead className="sticky top-0 bg-paper-sunk">
          <tr>
            {columns.map((c) => (
              <th key={c.header} scope="col" className={cn('px-3 py-2 font-semibold text-ink', c.numeric && 'text-right')}>
                {c.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => (
            <tr key={rowKey(row, i)} className="border-t border-rule">
              {columns.map((c) => {
                const Cell = c.rowHeader ? 'th' : 'td';
                return (
                  <Cell key={c.header} scope={c.rowHeader ? 'row' : undefined} className={cn('px-3 py-1.5 align-top font-normal text-ink', c.numeric && 'figures text-right')}>
                    {c.cell(row)}
                  </Cell>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
