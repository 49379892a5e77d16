import { useState } from 'react';
import { Link, useLocation, useParams } from 'react-router-dom';
import { stateLabels } from '@shared/catalogue/workflow';
import { Alert } from '@/components/alert';
import { Button, buttonClasses } from '@/components/button';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { FacsimilePane } from '@/features/facsimiles/components/facsimile-pane';
import { useSource } from '@/features/sources/api/get-source';
import { errorMessage, isApiError } from '@/lib/api';
import { useExcerpt } from '../api/get-excerpt';
import { BesideFacsimile } from '../components/beside-facsimile';
import { ExcerptAsideSlots } from '../components/excerpt-aside-slots';
import { CitePanel } from '@/features/citations';
import { AddToProgrammeButton } from '@/features/programmes';
import { ExcerptCitation } from '../components/excerpt-citation';
import { ExcerptTags } from '../components/excerpt-tags';
import { ExcerptText } from '../components/excerpt-text';

/** /excerpts/:id: a passage beside its facsimile page, with its tags, credit and citation. */
export function Component() {
  const { id = '' } = useParams();
  const location = useLocation();
  const notice = (location.state as { notice?: string } | null)?.notice;
  const excerpt = useExcerpt(id);
  const source = useSource(excerpt.data?.data.source.id ?? '');
  const [page, setPage] = useState<number | null>(null);

  if (excerpt.isPending) return <PageSpinner label="Loading the excerpt…" />;
  if (excerpt.isError) {
    const missing = isApiError(excerpt.error) && excerpt.error.status === 404;
    return (
      <Alert
        tone="danger"
        title={missing ? 'No such excerpt' : 'The excerpt could not be loaded'}
        action={missing ? <Link to="/sources">All sources</Link> : <Button variant="secondary" onClick={() => void excerpt.refetch()}>Try again</Button>}
      >
        {missing ? 'It may not be approved yet, or the link is mistyped.' : errorMessage(excerpt.error)}
      </Alert>
    );
  }

  const { data, abilities } = excerpt.data;
  const facsimiles = source.data?.data.facsimiles ?? [];
  const text = (
    <article className="space-y-8">
      {notice && <Alert tone="success">{notice}</Alert>}
      {(data.status !== 'approved' || abilities.update) && (
        <div className="flex flex-wrap items-center gap-3">
          {data.status !== 'approved' && <span className="text-sm text-ink-muted">State: {stateLabels[data.status]}</span>}
          {abilities.update && (
            <Link to={`/excerpts/${data.id}/edit`} className={buttonClasses('secondary', 'sm')}>
              Edit excerpt
            </Link>
          )}
        </div>
      )}
      <ExcerptText excerpt={data} />
      <section aria-labelledby="tags-heading" className="rounded-soft border border-rule bg-paper-raised p-4">
        <h2 id="tags-heading" className="mb-3 font-serif text-xl font-medium">
          Tags
        </h2>
        <ExcerptTags excerpt={data} />
      </section>
      <section aria-labelledby="cite-heading">
        <h2 id="cite-heading" className="mb-2 font-serif text-xl font-medium">
          Source and credit
        </h2>
        <ExcerptCitation excerpt={data} />
      </section>
      <ExcerptAsideSlots
        cite={data.approvedVersion ? <CitePanel target={{ kind: 'excerpt', id: data.id }} /> : null}
        programme={data.approvedVersion ? <AddToProgrammeButton excerptId={data.id} locator={data.locator.label} quotation={data.translation ?? data.diplomatic} sourceTitle={data.source.title} /> : null}
      />
    </article>
  );

  return (
    <>
      <PageHeader
        eyebrow={<Link to={`/sources/${data.source.id}`}>{data.source.title}</Link>}
        title={`${data.locator.label} · ${data.source.title}`}
        description={<span className="figures">{data.date.label}</span>}
      />
      {facsimiles.length > 0 ? (
        <BesideFacsimile
          facsimile={
            <FacsimilePane facsimiles={facsimiles} page={page ?? data.facsimilePage ?? 1} onPageChange={setPage} className="flex h-full flex-col" />
          }
        >
          {text}
        </BesideFacsimile>
      ) : (
        <div className="max-w-reading">{text}</div>
      )}
    </>
  );
}
