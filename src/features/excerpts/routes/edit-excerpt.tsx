import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { FacsimilePane } from '@/features/facsimiles/components/facsimile-pane';
import { useSource } from '@/features/sources/api/get-source';
import { errorMessage } from '@/lib/api';
import { useExcerpt } from '../api/get-excerpt';
import { BesideFacsimile } from '../components/beside-facsimile';
import { ExcerptForm } from '../components/excerpt-editor/excerpt-form';

/** /excerpts/:id/edit */
export function Component() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const excerpt = useExcerpt(id);
  const sourceId = excerpt.data?.data.source.id ?? '';
  const source = useSource(sourceId);
  const [page, setPage] = useState<number | null>(null);

  if (excerpt.isPending) return <PageSpinner label="Loading the excerpt…" />;
  if (excerpt.isError) {
    return (
      <Alert tone="danger" title="The excerpt could not be loaded" action={<Button variant="secondary" onClick={() => void excerpt.refetch()}>Try again</Button>}>
        {errorMessage(excerpt.error)}
      </Alert>
    );
  }
  const { data, abilities } = excerpt.data;
  const header = (
    <PageHeader
      eyebrow={
        <>
          <Link to={`/sources/${data.source.id}`}>{data.source.title}</Link> · <Link to={`/excerpts/${data.id}`}>{data.locator.label}</Link>
        </>
      }
      title="Edit excerpt"
      description={
        data.status !== 'approved'
          ? `Version ${data.version}.`
          : abilities.publish
            ? 'This excerpt is approved: your changes make a new version for review, or, as an editor, you may publish a correction at once.'
            : 'This excerpt is approved: your changes make a new version for review.'
      }
    />
  );
  if (!abilities.update) {
    return (
      <>
        {header}
        <Alert tone="info" title="This excerpt cannot be edited now">
          It may be awaiting review, or belong to someone else. <Link to={`/excerpts/${data.id}`}>Back to the excerpt</Link>.
        </Alert>
      </>
    );
  }
  const facsimiles = source.data?.data.facsimiles ?? [];
  const currentPage = page ?? data.facsimilePage ?? 1;
  const form = (
    <ExcerptForm
      key={data.id}
      source={{ id: data.source.id, languages: data.source.languages, dateLabel: data.source.date.label }}
      excerpt={data}
      canPublish={abilities.publish}
      currentPage={facsimiles.length ? currentPage : null}
      onSaved={(saved) => navigate(`/excerpts/${saved.id}`, { state: { notice: 'Your changes were saved.' } })}
      onCancel={() => navigate(`/excerpts/${data.id}`)}
    />
  );
  return (
    <>
      {header}
      {facsimiles.length > 0 ? (
        <BesideFacsimile facsimile={<FacsimilePane facsimiles={facsimiles} page={currentPage} onPageChange={setPage} className="flex h-full flex-col" />}>
          {form}
        </BesideFacsimile>
      ) : (
        <div className="max-w-3xl">{form}</div>
      )}
    </>
  );
}
