import type { ReactNode } from 'react';
import type { FieldDiff, TextPart } from '@shared/review/types';
import { EmptyState } from '@/components/empty-state';

/** Insertions are underlined, deletions struck through, and both are named for screen readers: never colour alone. */
function Inserted({ children }: { children: string }) {
  return (
    <ins className="rounded-sm bg-accent-soft text-ink underline decoration-2 underline-offset-2">
      <span className="sr-only">[inserted: </span>
      {children}
      <span className="sr-only">]</span>
    </ins>
  );
}

function Deleted({ children }: { children: string }) {
  return (
    <del className="rounded-sm bg-danger-soft text-ink-muted line-through decoration-2">
      <span className="sr-only">[deleted: </span>
      {children}
      <span className="sr-only">]</span>
    </del>
  );
}

function TextChange({ parts }: { parts: TextPart[] }) {
  return (
    <p className="transcription text-[1.0625rem]">
      {parts.map((part, i) =>
        part.added ? <Inserted key={i}>{part.value}</Inserted> : part.removed ? <Deleted key={i}>{part.value}</Deleted> : <span key={i}>{part.value}</span>,
      )}
    </p>
  );
}

const marks = { added: { sign: '+', word: 'Added' }, removed: { sign: '−', word: 'Removed' }, same: { sign: '·', word: 'Unchanged' } } as const;

function Change({ change }: { change: FieldDiff }) {
  if (change.type === 'text') return <TextChange parts={change.parts} />;
  if (change.type === 'list') {
    return (
      <ul className="space-y-1">
        {change.items.map((item, i) => (
          <li key={i} className="flex gap-2">
            <span aria-hidden="true" className="figures w-4 font-semibold">
              {marks[item.change].sign}
            </span>
            <span className="label-caps w-24 shrink-0 pt-0.5 text-ink-muted">{marks[item.change].word}</span>
            {item.change === 'added' ? <Inserted>{item.value}</Inserted> : item.change === 'removed' ? <Deleted>{item.value}</Deleted> : <span>{item.value}</span>}
          </li>
        ))}
      </ul>
    );
  }
  return (
    <p>
      {change.before !== null ? <Deleted>{change.before}</Deleted> : <em className="text-ink-muted">empty</em>}
      <span aria-hidden="true"> → </span>
      <span className="sr-only"> changed to </span>
      {change.after !== null ? <Inserted>{change.after}</Inserted> : <em className="text-ink-muted">empty</em>}
    </p>
  );
}

export interface DiffViewProps {
  changes: FieldDiff[];
  /** e.g. "since the last approved version". */
  emptyText?: string;
  /** Extra controls per field, e.g. "Comment on this field" on the review page. */
  fieldAction?: (field: string, label: string) => ReactNode;
}

/** A readable diff, field by field: words for texts, entries for lists, before → after for single values. */
export function DiffView({ changes, emptyText = 'No changes between these versions.', fieldAction }: DiffViewProps) {
  if (!changes.length) return <EmptyState title="Nothing changed">{emptyText}</EmptyState>;
  return (
    <dl className="divide-y divide-rule rounded-soft border border-rule bg-paper-raised">
      {changes.map((change) => (
        <div key={change.field} id={`diff-${change.field}`} className="grid gap-2 px-4 py-3 sm:grid-cols-[12rem_1fr]">
          <dt className="text-sm font-semibold text-ink">
            {change.label}
            {fieldAction && <div className="mt-1">{fieldAction(change.field, change.label)}</div>}
          </dt>
          <dd className="min-w-0 break-words">
            <Change change={change} />
          </dd>
        </div>
      ))}
    </dl>
  );
}
