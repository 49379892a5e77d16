import { Link } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useMySubmissions } from '../api/get-my-submissions';
import { SubmissionsList } from '../components/submissions-list';

/** My submissions: status of everything I added, and what the editors asked me to fix. */
export function Component() {
  const query = useMySubmissions();
  const returned = query.data?.data.filter((s) => s.status === 'returned').length ?? 0;
  return (
    <>
      <PageHeader
        title="My submissions"
        description={returned ? `${returned} item${returned === 1 ? '' : 's'} came back with comments: fix and submit again.` : 'Your sources and excerpts, and where each stands.'}
        actions={<Link to="/contribute">Add a source</Link>}
      />
      {query.isPending ? (
        <PageSpinner label="Loading your submissions…" />
      ) : query.isError ? (
        <Alert tone="danger" title="Your submissions could not be loaded">{errorMessage(query.error)}</Alert>
      ) : query.data.data.length === 0 ? (
        <EmptyState title="Nothing yet" action={<Link to="/contribute">Catalogue a source</Link>}>Sources and excerpts you add appear here.</EmptyState>
      ) : (
        <SubmissionsList items={query.data.data} />
      )}
    </>
  );
}
