import { Link, useNavigate, useParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useSource } from '../api/get-source';
import { SourceForm } from '../components/source-form/source-form';

/** /sources/:id/edit */
export function Component() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const source = useSource(id);

  if (source.isPending) return <PageSpinner label="Loading the source…" />;
  if (source.isError) {
    return (
      <Alert
        tone="danger"
        title="The source could not be loaded"
        action={
          <Button variant="secondary" onClick={() => void source.refetch()}>
            Try again
          </Button>
        }
      >
        {errorMessage(source.error)}
      </Alert>
    );
  }
  const { data, abilities } = source.data;
  if (!abilities.update) {
    return (
      <>
        <PageHeader eyebrow="Sources" title={`Edit: ${data.title}`} />
        <Alert tone="info" title="This source cannot be edited now">
          <p>
            It may be awaiting review, or belong to someone else. <Link to={`/sources/${data.id}`}>Back to the source</Link>.
          </p>
        </Alert>
      </>
    );
  }
  return (
    <>
      <PageHeader
        eyebrow={<Link to={`/sources/${data.id}`}>← {data.title}</Link>}
        title="Edit source"
        description={
          data.status === 'approved'
            ? abilities.publish
              ? 'This source is approved: your changes make a new version for review, or, as an editor, you may publish a correction at once.'
              : 'This source is approved: your changes make a new version, which readers see once an editor approves it.'
            : `Version ${data.version}.`
        }
      />
      <div className="max-w-3xl">
        <SourceForm
          key={data.id}
          source={data}
          canPublish={abilities.publish}
          onSaved={(saved) => navigate(`/sources/${saved.id}`, { state: { notice: 'Your changes were saved.' } })}
          onCancel={() => navigate(`/sources/${data.id}`)}
        />
      </div>
    </>
  );
}
