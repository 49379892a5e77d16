import { useState } from 'react';
import { Link, useLocation, useParams } from 'react-router-dom';
import { sourceTypeLabels } from '@shared/catalogue/vocabulary';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { CitePanel } from '@/features/citations';
import { FacsimileList } from '@/features/facsimiles/components/facsimile-list';
import { FacsimileViewer } from '@/features/facsimiles/components/facsimile-viewer';
import { UploadPanel } from '@/features/facsimiles/components/upload-panel';
import { errorMessage, isApiError } from '@/lib/api';
import { useSource } from '../api/get-source';
import { ExcerptsList } from '../components/excerpts-list';
import { SourceActions } from '../components/source-actions';
import { SourceDetails } from '../components/source-details';
import { StatusBadge } from '../components/status-badge';

/** /sources/:id: the description, facsimiles and excerpts of one source. */
export function Component() {
  const { id = '' } = useParams();
  const location = useLocation();
  const notice = (location.state as { notice?: string } | null)?.notice;
  const source = useSource(id);
  const [openId, setOpenId] = useState<number | null>(null);
  const [page, setPage] = useState(1);

  if (source.isPending) return <PageSpinner label="Loading the source…" />;
  if (source.isError) {
    const missing = isApiError(source.error) && source.error.status === 404;
    return (
      <Alert
        tone="danger"
        title={missing ? 'No such source' : 'The source could not be loaded'}
        action={
          missing ? (
            <Link to="/sources">All sources</Link>
          ) : (
            <Button variant="secondary" onClick={() => void source.refetch()}>
              Try again
            </Button>
          )
        }
      >
        {missing ? 'It may have been withdrawn, or the link is mistyped.' : errorMessage(source.error)}
      </Alert>
    );
  }

  const { data, abilities } = source.data;
  const open = data.facsimiles.find((f) => f.id === openId) ?? null;
  const contributorView = abilities.update || abilities.review || data.status !== 'approved';
  const hasActions = abilities.update || abilities.addExcerpt || abilities.submit || abilities.withdraw || abilities.reopen;

  return (
    <>
      <PageHeader
        eyebrow={
          <>
            <Link to="/sources">Sources</Link> · {sourceTypeLabels[data.sourceType]}
          </>
        }
        title={data.title}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <span className="figures">{data.date.label}</span>
            {data.place && <span>· {data.place}</span>}
            {contributorView && <StatusBadge status={data.status} />}
          </span>
        }
      />
      {notice && (
        <Alert tone="success" className="mb-4">
          {notice}
        </Alert>
      )}
      {data.showingApprovedVersion && (
        <Alert tone="info" className="mb-4" title="Approved version shown">
          A newer version of this source is awaiting review; readers see this one until it is approved.
        </Alert>
      )}
      {hasActions && (
        <div className="mb-6">
          <SourceActions source={data} abilities={abilities} />
        </div>
      )}

      {open && (
        <FacsimileViewer
          key={open.id}
          facsimile={open}
          page={page}
          onPageChange={setPage}
          className="mb-8 h-[80vh]"
        />
      )}

      <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-8">
          <Card title="Description">
            <SourceDetails source={data} />
          </Card>
          <section aria-labelledby="excerpts-heading">
            <div className="mb-3 flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="excerpts-heading" className="font-serif text-2xl font-medium">
                Excerpts
              </h2>
              {abilities.addExcerpt && <Link to={`/sources/${data.id}/excerpts/new`}>Add an excerpt</Link>}
            </div>
            {data.excerpts.length > 0 ? (
              <ExcerptsList excerpts={data.excerpts} showStatus={contributorView} />
            ) : (
              <EmptyState title="No excerpts yet">
                {abilities.addExcerpt ? 'Transcribe the passages about woodwinds, beside the facsimile page.' : 'Passages from this source will appear here once transcribed and approved.'}
              </EmptyState>
            )}
          </section>
        </div>
        <aside aria-labelledby="facsimiles-heading" className="space-y-4">
          <h2 id="facsimiles-heading" className="font-serif text-2xl font-medium">
            Facsimiles
          </h2>
          {data.facsimiles.length > 0 ? (
            <FacsimileList
              facsimiles={data.facsimiles}
              openId={openId}
              onOpen={(next) => {
                setOpenId(next);
                setPage(1);
              }}
            />
          ) : (
            <p className="text-sm text-ink-muted">
              {data.facsimileAccess === 'hidden' ? 'The facsimile is not shown, under the holder’s terms.' : 'No facsimile has been uploaded.'}
            </p>
          )}
          {abilities.upload && (
            <Card title="Upload a facsimile" headingLevel={3}>
              <UploadPanel sourceId={data.id} rightsStatement={data.rightsStatement} />
            </Card>
          )}
          {data.approvedVersion && <CitePanel target={{ kind: 'source', id: data.id }} />}
        </aside>
      </div>
    </>
  );
}
