import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { api, errorMessage } from '@/lib/api';
import type { ReindexState } from '@shared/search/reindex';


const reindexQuery = () =>
  queryOptions({
    queryKey: ['admin', 'reindex'] as const,
    queryFn: ({ signal }) => api.get<{ data: ReindexState }>('/api/admin/reindex', { signal }),
    refetchInterval: (query) => (query.state.data?.data.running ? 1000 : false),
  });

/** Admin → Re-index: rebuild the search index from the database while the archive keeps answering. */
export function Component() {
  const queryClient = useQueryClient();
  const status = useQuery(reindexQuery());
  const start = useMutation({
    mutationFn: () => api.post<{ data: ReindexState }>('/api/admin/reindex', {}),
    onSuccess: (result) => queryClient.setQueryData(reindexQuery().queryKey, result),
  });
  const state = status.data?.data;
  const percent = state && state.total > 0 ? Math.round((100 * state.done) / state.total) : 0;

  return (
    <>
      <PageHeader
        eyebrow="Admin"
        title="Re-index"
        description="Rebuild the search index from MariaDB, the archive's source of truth. Searches keep answering while it runs; use it after restoring a backup or moving to a new search service."
      />
      {status.isPending ? (
        <PageSpinner label="Reading the index state…" />
      ) : status.isError ? (
        <Alert tone="danger" title="The state could not be read">{errorMessage(status.error)}</Alert>
      ) : (
        <Card className="max-w-2xl">
          {state?.running ? (
            <div className="space-y-2">
              <p>
                Re-indexing: <span className="figures">{state.done}</span> of <span className="figures">{state.total}</span> excerpts
                (<span className="figures">{state.docsPerSecond}</span> a second).
              </p>
              <progress className="w-full" max={100} value={percent} aria-label="Re-index progress" aria-valuenow={percent}>
                {percent}%
              </progress>
            </div>
          ) : (
            <div className="space-y-3">
              {state?.finishedAt && !state.error && (
                <Alert tone="success" title="Last re-index finished">
                  <span className="figures">{state.done}</span> excerpts, finished {new Date(state.finishedAt).toLocaleString('en-GB')}.
                </Alert>
              )}
              {state?.error && <Alert tone="danger" title="The last re-index failed">{state.error}</Alert>}
              {start.isError && <Alert tone="danger" title="Could not start">{errorMessage(start.error)}</Alert>}
              <Button onClick={() => start.mutate()} loading={start.isPending}>
                Rebuild the search index
              </Button>
            </div>
          )}
        </Card>
      )}
    </>
  );
}
