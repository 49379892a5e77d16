import { useSearchParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { Pagination } from '@/components/pagination';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useReviewQueue, type ReviewQueueQuery } from '../api/get-review-queue';
import { QueueFilters, type QueueFilterValues } from '../components/queue-filters';
import { QueueTable } from '../components/queue-table';
import { StateCountsTable } from '../components/state-counts';

const keys: (keyof QueueFilterValues)[] = ['kind', 'sourceType', 'contributor', 'minAgeDays', 'lang', 'sort'];

/** Review: what awaits a decision, oldest first. */
export function Component() {
  const [params, setParams] = useSearchParams();
  const values = Object.fromEntries(keys.map((k) => [k, params.get(k) ?? (k === 'sort' ? 'oldest' : '')])) as unknown as QueueFilterValues;
  const page = Math.max(1, Number(params.get('page')) || 1);
  const query: ReviewQueueQuery = {
    page,
    perPage: 25,
    kind: (values.kind || undefined) as ReviewQueueQuery['kind'],
    sourceType: values.sourceType || undefined,
    contributor: values.contributor || undefined,
    minAgeDays: values.minAgeDays ? Number(values.minAgeDays) : undefined,
    lang: values.lang || undefined,
    sort: values.sort === 'newest' ? 'newest' : 'oldest',
  };
  const queue = useReviewQueue(query);
  const apply = (next: Partial<QueueFilterValues> & { page?: string }) =>
    setParams(() => {
      const merged = new URLSearchParams();
      for (const [k, v] of Object.entries({ ...values, page: undefined, ...next })) if (v && !(k === 'sort' && v === 'oldest')) merged.set(k, v);
      return merged;
    });

  return (
    <>
      <PageHeader eyebrow="Editors" title="Review" description="Sources and excerpts awaiting a decision. The longest-waiting come first." />
      <QueueFilters values={values} onChange={(v) => apply(v)} />
      {queue.isPending ? (
        <PageSpinner label="Loading the queue…" />
      ) : queue.isError ? (
        <Alert tone="danger" title="The queue could not be loaded" action={<Button variant="secondary" onClick={() => void queue.refetch()}>Try again</Button>}>
          {errorMessage(queue.error)}
        </Alert>
      ) : (
        <>
          <StateCountsTable counts={queue.data.counts} />
          {queue.data.data.length === 0 ? (
            <EmptyState title="Nothing awaits review">{params.size ? 'No submission matches these filters.' : 'Every submission has been decided.'}</EmptyState>
          ) : (
            <div aria-busy={queue.isFetching || undefined}>
              <QueueTable rows={queue.data.data} caption={`Awaiting review, page ${queue.data.page}`} />
              <Pagination
                label="Review queue pages"
                noun="submissions"
                page={queue.data.page}
                perPage={queue.data.perPage}
                total={queue.data.total}
                disabled={queue.isFetching}
                onPageChange={(p) => apply({ page: p > 1 ? String(p) : undefined })}
              />
            </div>
          )}
        </>
      )}
    </>
  );
}
