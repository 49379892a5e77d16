import { Link, useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { SourceForm } from '@/features/sources/components/source-form/source-form';

/** /contribute: catalogue a new source. Facsimiles and excerpts are added from the source's page once it is saved. */
export function Component() {
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        eyebrow="Contribute"
        title="Catalogue a new source"
        description={
          <>
            Record the document first; once it is saved you can upload its facsimile and transcribe excerpts. Everything stays a
            private draft until you submit it for review. <Link to="/sources?mine=1">Your sources so far</Link>. Have
            references in BibTeX or RIS already? <Link to="/import">Import them as drafts</Link>.
          </>
        }
      />
      <div className="max-w-3xl">
        <SourceForm
          onSaved={(source) => navigate(`/sources/${source.id}`, { state: { notice: 'The source was saved as a draft.' } })}
          onCancel={() => navigate(-1)}
        />
      </div>
    </>
  );
}
