import type { FacsimileView } from '@shared/catalogue/types';
import { useFacsimile } from '../api/get-facsimile';
import { ProgressBar } from './progress-bar';

/** Text extraction of one facsimile, polled every second until it is done or has failed. */
export function ExtractionProgress({ facsimile }: { facsimile: FacsimileView }) {
  const watching = facsimile.extractionStatus === 'pending' || facsimile.extractionStatus === 'running';
  const query = useFacsimile(facsimile.id, { enabled: watching });
  const current = query.data?.data ?? facsimile;
  const { extractionStatus: status, extractionProgress: done, pageCount } = current;

  if (status === 'done') {
    return (
      <p className="text-sm text-ink-muted" role="status">
        <span aria-hidden="true">✓ </span>
        Text extracted{pageCount ? ` from ${pageCount} page${pageCount === 1 ? '' : 's'}` : ''}.
      </p>
    );
  }
  if (status === 'failed') {
    return (
      <p className="text-sm font-medium text-danger" role="status">
        <span aria-hidden="true">✕ </span>
        Text could not be extracted{current.extractionError ? `: ${current.extractionError}` : '.'} The facsimile can still be viewed.
      </p>
    );
  }
  const value = pageCount ? (done / pageCount) * 100 : status === 'pending' ? null : 0;
  return (
    <ProgressBar
      label={status === 'pending' ? 'Waiting to extract text' : 'Extracting text'}
      value={value}
      valueText={pageCount ? `${done} of ${pageCount} pages` : status === 'pending' ? 'Queued' : `${done} pages`}
    />
  );
}
