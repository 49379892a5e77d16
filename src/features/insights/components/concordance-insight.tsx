import { Alert } from '@/components/alert';
import { PageSpinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { useConcordancePicture } from '../api/get-concordance';
import { ConcordancePicture } from './concordance-picture';

/** The concordance picture with its own data (`GET /api/concordance`), for the concordance page. */
export function ConcordanceInsight({ headingLevel = 2 }: { headingLevel?: 2 | 3 }) {
  const concordance = useConcordancePicture();
  if (concordance.isPending) return <PageSpinner label="Loading the concordance picture…" />;
  if (concordance.isError) {
    return (
      <Alert tone="caution" title="The concordance picture is not available">
        {errorMessage(concordance.error)}
      </Alert>
    );
  }
  return <ConcordancePicture entries={concordance.data.data} headingLevel={headingLevel} />;
}
