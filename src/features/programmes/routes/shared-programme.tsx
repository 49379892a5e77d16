import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { Alert } from '@/components/alert';
import { Card } from '@/components/card';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { sharedExportUrl, sharedPreviewQueryOptions, sharedProgrammeQueryOptions } from '../api/programmes';
import { ExportLinks } from '../components/export-links';
import { PreviewPane } from '../components/notes-editor';
import { PiecesTable } from '../components/pieces-table';

/** /p/:shareToken — a programme shared by its owner, read-only, for anyone with the link. */
export function Component() {
  const { shareToken = '' } = useParams();
  const programme = useQuery(sharedProgrammeQueryOptions(shareToken));
  const preview = useQuery(sharedPreviewQueryOptions(shareToken));
  if (programme.isLoading) return <PageSpinner />;
  if (programme.isError || !programme.data) return <Alert tone="danger">{errorMessage(programme.error)}</Alert>;
  const p = programme.data;
  return (
    <div>
      <PageHeader title={p.title} eyebrow={p.ownerName ? `A programme by ${p.ownerName}` : 'Shared programme'}
        description={[p.performanceDate, p.venue].filter(Boolean).join(' · ')} />
      {p.performers.length > 0 && <ul className="mb-6">{p.performers.map((q, i) => <li key={i}>{q.name}{q.role ? `, ${q.role}` : ''}</li>)}</ul>}
      {p.pieces.length > 0 && <Card title="Pieces" className="mb-6"><PiecesTable pieces={p.pieces} readOnly /></Card>}
      <PreviewPane preview={preview.data ?? null} />
      <div className="mt-6"><ExportLinks urlFor={(format) => sharedExportUrl(shareToken, format)} /></div>
    </div>
  );
}
