import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { FacsimilePane } from '@/features/facsimiles/components/facsimile-pane';
import { useSource } from '@/features/sources/api/get-source';
import { errorMessage } from '@/lib/api';
import { BesideFacsimile } from '../components/beside-facsimile';
import { ExcerptForm } from '../components/excerpt-editor/excerpt-form';

/** /sources/:id/excerpts/new: transcribe a passage beside the facsimile. */
export function Component() {
  const { id = '' } = useParams();
  const navigate = useNavigate();
  const source = useSource(id);
  const [page, setPage] = useState(1);

  if (source.isPending) return <PageSpinner label="Loading the source…" />;
  if (source.isError) {
    return (
      <Alert tone="danger" title="The source could not be loaded" action={<Button variant="secondary" onClick={() => void source.refetch()}>Try again</Button>}>
        {errorMessage(source.error)}
      </Alert>
    );
  }
  const { data, abilities } = source.data;
  const header = <PageHeader eyebrow={<Link to={`/sources/${data.id}`}>← {data.title}</Link>} title="New excerpt" />;
  if (!abilities.addExcerpt) {
    return (
      <>
        {header}
        <Alert tone="info" title="Excerpts cannot be added to this source now">
          It may be awaiting review, or belong to someone else. <Link to={`/sources/${data.id}`}>Back to the source</Link>.
        </Alert>
      </>
    );
  }
  const hasFacsimile = data.facsimiles.length > 0;
  const form = (
    <ExcerptForm
      source={{ id: data.id, languages: data.languages, dateLabel: data.date.label }}
      currentPage={hasFacsimile ? page : null}
      onSaved={(excerpt) => navigate(`/excerpts/${excerpt.id}`, { state: { notice: 'The excerpt was saved as a draft.' } })}
      onCancel={() => navigate(`/sources/${data.id}`)}
    />
  );
  return (
    <>
      {header}
      {hasFacsimile ? (
        <BesideFacsimile facsimile={<FacsimilePane facsimiles={data.facsimiles} page={page} onPageChange={setPage} className="flex h-full flex-col" />}>
          {form}
        </BesideFacsimile>
      ) : (
        <div className="max-w-3xl space-y-4">
          <Alert tone="info" title="No facsimile yet">
            You can transcribe from the original; <Link to={`/sources/${data.id}`}>upload a facsimile</Link> to work beside its pages.
          </Alert>
          {form}
        </div>
      )}
    </>
  );
}
