import type { EntityKind, ReviewRecord } from '@shared/review/types';
import { fieldLabel } from '@shared/review/fields';
import { formatDate } from '@/lib/format';

const words = { approve: 'Approved', return: 'Returned for changes', reject: 'Rejected' } as const;

/** Earlier decisions with their comments, newest first; field comments link to their field. */
export function ReviewHistory({ kind, reviews }: { kind: EntityKind; reviews: ReviewRecord[] }) {
  if (!reviews.length) return <p className="text-ink-muted">No decisions yet.</p>;
  return (
    <ol className="space-y-3">
      {reviews.map((r) => (
        <li key={r.id} className="rounded-soft border border-rule bg-paper-raised p-3">
          <p className="text-sm">
            <strong>{words[r.decision]}</strong> — version <span className="figures">{r.version}</span>, by {r.editor?.displayName ?? 'an editor'},{' '}
            <span className="figures">{formatDate(r.createdAt)}</span>
          </p>
          {r.comment && <blockquote className="mt-1 border-l-2 border-rule-strong pl-3">{r.comment}</blockquote>}
          {r.fieldComments.length > 0 && (
            <ul className="mt-2 space-y-1 text-sm">
              {r.fieldComments.map((c, i) => (
                <li key={i}>
                  <a href={`#field-${c.field}`} className="font-medium">{fieldLabel(kind, c.field)}</a>: {c.comment}
                </li>
              ))}
            </ul>
          )}
        </li>
      ))}
    </ol>
  );
}
