import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { ReviewDecision } from '@shared/catalogue/vocabulary';
import { entityKinds, type EntityKind, type FieldComment } from '@shared/review/types';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
// A route file is where features meet: the facsimile viewer and the history's diff and field views.
import { FacsimileViewer } from '@/features/facsimiles/components/facsimile-viewer';
import { DiffView } from '@/features/history/components/diff-view';
import { SnapshotFields } from '@/features/history/components/snapshot-fields';
import { useReview } from '../api/get-review';
import { useDecideReview } from '../api/decide-review';
import { DecisionForm } from '../components/decision-form';
import { ReviewHistory } from '../components/review-history';

const decided = { approve: 'approved', return: 'returned to the contributor', reject: 'rejected' } as const;

/** The review page: facsimile beside the item, the diff, field comments and the decision. */
export function Component() {
  const params = useParams();
  const kind = (entityKinds as readonly string[]).includes(params.kind ?? '') ? (params.kind as EntityKind) : 'excerpt';
  const id = params.id ?? '';
  const review = useReview(kind, id);
  const decide = useDecideReview();
  const [fieldComments, setFieldComments] = useState<FieldComment[]>([]);
  const [page, setPage] = useState<number | null>(null);
  const [done, setDone] = useState('');
  const [view, setView] = useState<'diff' | 'since' | 'all'>('diff');

  if (review.isPending) return <PageSpinner label="Loading the submission…" />;
  if (review.isError) return <Alert tone="danger" title="This submission could not be loaded">{errorMessage(review.error)}</Alert>;
  const item = review.data.data;

  const addComment = (field: string) => {
    if (!fieldComments.some((c) => c.field === field)) setFieldComments([...fieldComments, { field, comment: '' }]);
  };
  const commentButton = item.abilities.decide
    ? (field: string, label: string) => (
        <Button variant="quiet" size="sm" onClick={() => addComment(field)}>
          Comment<span className="sr-only"> on {label}</span>
        </Button>
      )
    : undefined;
  const onDecide = (decision: ReviewDecision, comment: string) =>
    decide.mutate(
      { target: { kind, id, version: item.version }, decision, comment: comment || undefined, fieldComments: fieldComments.filter((c) => c.comment.trim()) },
      {
        onSuccess: (r) => {
          setDone(`Version ${item.version} ${decided[decision]}${r.alsoApproved.length ? `, with ${r.alsoApproved.length} excerpt(s)` : ''}. The contributor has been e-mailed.`);
          setFieldComments([]);
        },
      },
    );
  const shown = view === 'since' && item.sinceLastReview ? item.sinceLastReview : item.diff;

  return (
    <>
      <PageHeader
        eyebrow={`Review · ${item.kind === 'source' ? 'Source' : 'Excerpt'} · ${item.statusLabel}`}
        title={item.title}
        description={<>Version <span className="figures">{item.version}</span>, contributed by {item.contributor?.displayName ?? 'unknown'}.</>}
        actions={
          <>
            <Link to="/review">Back to the queue</Link>
            <Link to={`/history/${kind}/${id}`}>History</Link>
          </>
        }
      />
      {done && <Alert tone="success" className="mb-6" title="Decision recorded">{done} <Link to="/review">Next in the queue</Link></Alert>}
      <div className="grid gap-8 lg:grid-cols-2">
        <section aria-labelledby="facsimile-heading" className="lg:sticky lg:top-4 lg:self-start">
          <h2 id="facsimile-heading" className="mb-2 font-serif text-2xl">Facsimile</h2>
          {item.facsimile ? (
            <FacsimileViewer facsimile={item.facsimile.view} page={page ?? item.facsimile.page ?? 1} onPageChange={setPage} />
          ) : (
            <p className="text-ink-muted">No facsimile uploaded for this source.</p>
          )}
        </section>
        <div className="space-y-8">
          <section aria-labelledby="changes-heading">
            <h2 id="changes-heading" className="mb-2 font-serif text-2xl">Changes</h2>
            <div role="group" aria-label="Show" className="mb-3 flex flex-wrap gap-2">
              <Button size="sm" variant={view === 'diff' ? 'primary' : 'secondary'} aria-pressed={view === 'diff'} onClick={() => setView('diff')}>
                {item.diff.from ? `Since approved v${item.diff.from}` : 'Everything (first submission)'}
              </Button>
              {item.sinceLastReview && (
                <Button size="sm" variant={view === 'since' ? 'primary' : 'secondary'} aria-pressed={view === 'since'} onClick={() => setView('since')}>
                  Since the last decision (v{item.sinceLastReview.from})
                </Button>
              )}
              <Button size="sm" variant={view === 'all' ? 'primary' : 'secondary'} aria-pressed={view === 'all'} onClick={() => setView('all')}>
                Every field
              </Button>
            </div>
            {view === 'all' ? (
              <SnapshotFields kind={kind} snapshot={item.item} fieldAction={commentButton} />
            ) : (
              <DiffView changes={shown.changes} emptyText="Nothing changed since the last approved version." fieldAction={commentButton} />
            )}
          </section>
          {item.excerpts.length > 0 && (
            <section aria-labelledby="excerpts-heading">
              <h2 id="excerpts-heading" className="mb-2 font-serif text-2xl">Excerpts</h2>
              <ul className="space-y-1">
                {item.excerpts.map((e) => (
                  <li key={e.id}>
                    <Link to={`/review/excerpt/${e.id}`}>{e.locator}</Link> <span className="text-sm text-ink-muted">— {e.status}, v{e.version}</span>
                  </li>
                ))}
              </ul>
              <p className="mt-2 text-sm text-ink-muted">Approving the source approves its excerpts awaiting review; return single excerpts from their own page.</p>
            </section>
          )}
          <section aria-labelledby="decision-heading">
            <h2 id="decision-heading" className="mb-2 font-serif text-2xl">Decision</h2>
            {item.abilities.decide ? (
              <DecisionForm kind={kind} fieldComments={fieldComments} onFieldCommentsChange={setFieldComments} pending={decide.isPending} error={decide.error} onDecide={onDecide} />
            ) : (
              <Alert tone="info" title="No decision possible here">{item.abilities.reason}</Alert>
            )}
          </section>
          <section aria-labelledby="earlier-heading">
            <h2 id="earlier-heading" className="mb-2 font-serif text-2xl">Earlier decisions</h2>
            <ReviewHistory kind={kind} reviews={item.reviews} />
          </section>
        </div>
      </div>
    </>
  );
}
