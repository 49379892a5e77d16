import { Link, useParams } from 'react-router-dom';
import { entityKinds, type EntityKind } from '@shared/review/types';
import { fieldLabel } from '@shared/review/fields';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
// Route files are where features meet: the field view comes from the history feature.
import { SnapshotFields } from '@/features/history/components/snapshot-fields';
import { useSubmission } from '../api/get-submission';
import { useSubmitExcerpt } from '../api/submit-excerpt';

/** One submission as its contributor sees it: status, the editors' comments beside the fields, and what to do next. */
export function Component() {
  const params = useParams();
  const kind = (entityKinds as readonly string[]).includes(params.kind ?? '') ? (params.kind as EntityKind) : 'excerpt';
  const id = params.id ?? '';
  const query = useSubmission(kind, id);
  const submit = useSubmitExcerpt();

  if (query.isPending) return <PageSpinner label="Loading…" />;
  if (query.isError) return <Alert tone="danger" title="This submission could not be loaded">{errorMessage(query.error)}</Alert>;
  const item = query.data.data;
  const last = item.reviews[0];
  const notes = new Map((last?.fieldComments ?? []).map((c) => [c.field, c.comment]));
  const editPath = kind === 'source' ? `/sources/${id}` : `/excerpts/${id}`;
  const returned = item.status === 'returned';

  return (
    <>
      <PageHeader
        eyebrow={`My submissions · ${item.statusLabel}`}
        title={item.title}
        actions={
          <>
            <Link to="/submissions">All my submissions</Link>
            <Link to={`/history/${kind}/${id}`}>History</Link>
          </>
        }
      />
      {returned && last && (
        <Alert tone="caution" title="Returned for changes" className="mb-6">
          {last.comment && <p>{last.editor?.displayName ?? 'An editor'} wrote: “{last.comment}”</p>}
          {notes.size > 0 && (
            <ul className="mt-2 list-disc pl-5">
              {[...notes].map(([field, comment]) => (
                <li key={field}><a href={`#field-${field}`}>{fieldLabel(kind, field)}</a>: {comment}</li>
              ))}
            </ul>
          )}
          <p className="mt-2">
            <Link to={editPath}>Edit the {kind}</Link>, then send it back:
          </p>
          {kind === 'excerpt' && (
            <div className="mt-2">
              <Button loading={submit.isPending} onClick={() => submit.mutate({ id, version: item.version }, { onSuccess: () => void query.refetch() })}>
                Submit again for review
              </Button>
              {submit.isError && <p role="alert" className="mt-2 text-danger">{errorMessage(submit.error)}</p>}
            </div>
          )}
          {kind === 'source' && <p className="mt-1">Submit the source again from its page.</p>}
        </Alert>
      )}
      {submit.isSuccess && <Alert tone="success" className="mb-6">Sent back to the editors as version {submit.data.data.version}.</Alert>}
      <SnapshotFields
        kind={kind}
        snapshot={item.item}
        fieldNotes={(field) =>
          notes.has(field) ? (
            <p className="mt-2 rounded-soft border-l-4 border-caution bg-caution-soft px-3 py-1 text-sm">
              <span className="font-semibold">Editor’s comment: </span>
              {notes.get(field)}
            </p>
          ) : null
        }
      />
    </>
  );
}
