import { Link } from 'react-router-dom';
import type { MySubmission } from '@shared/review/types';
import { fieldLabel } from '@shared/review/fields';
import { formatDate } from '@/lib/format';

const needsWork = (s: MySubmission) => s.status === 'returned';

/** The contributor's items, returned ones first, each with what the editors said. */
export function SubmissionsList({ items }: { items: MySubmission[] }) {
  return (
    <ul className="space-y-3">
      {items.map((s) => (
        <li key={`${s.kind}-${s.id}`} className={needsWork(s) ? 'rounded-soft border border-l-4 border-caution bg-paper-raised p-4' : 'rounded-soft border border-rule bg-paper-raised p-4'}>
          <p className="flex flex-wrap items-baseline gap-x-3">
            <span className="label-caps text-ink-muted">{s.kind === 'source' ? 'Source' : 'Excerpt'}</span>
            <Link to={`/submissions/${s.kind}/${s.id}`} className="font-medium">{s.title}</Link>
            <span className="text-sm">
              {needsWork(s) && <span aria-hidden="true">⚑ </span>}
              <strong>{s.statusLabel}</strong>
            </span>
            <span className="figures text-sm text-ink-muted">v{s.version}, {formatDate(s.updatedAt)}</span>
          </p>
          {s.lastReview && (s.lastReview.comment || s.lastReview.fieldComments.length > 0) && (
            <div className="mt-2 text-[0.9375rem]">
              <p className="text-sm text-ink-muted">{s.lastReview.editor?.displayName ?? 'An editor'} wrote:</p>
              {s.lastReview.comment && <blockquote className="border-l-2 border-rule-strong pl-3">{s.lastReview.comment}</blockquote>}
              {s.lastReview.fieldComments.length > 0 && (
                <ul className="mt-1 list-disc pl-5 text-sm">
                  {s.lastReview.fieldComments.map((c, i) => (
                    <li key={i}><strong>{fieldLabel(s.kind, c.field)}</strong>: {c.comment}</li>
                  ))}
                </ul>
              )}
            </div>
          )}
        </li>
      ))}
    </ul>
  );
}
