import type { FacsimileView } from '@shared/catalogue/types';
import { Button } from '@/components/button';
import { formatDate } from '@/lib/format';
import { ExtractionProgress } from './extraction-progress';

function sizeLabel(bytes: number): string {
  return bytes >= 1_048_576 ? `${(bytes / 1_048_576).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}

export interface FacsimileListProps {
  facsimiles: FacsimileView[];
  /** The one open in the viewer. */
  openId: number | null;
  onOpen: (id: number | null) => void;
}

/** Uploaded facsimiles with their text-extraction progress, each openable in the viewer. */
export function FacsimileList({ facsimiles, openId, onOpen }: FacsimileListProps) {
  return (
    <ul className="space-y-3">
      {facsimiles.map((f) => (
        <li key={f.id} className="rounded-soft border border-rule bg-paper-raised p-3">
          <div className="flex flex-wrap items-start justify-between gap-2">
            <div className="min-w-0">
              <p className="break-words font-medium">{f.originalName}</p>
              <p className="figures text-sm text-ink-muted">
                {f.mediaType === 'application/pdf' ? 'PDF' : 'Image'} · {sizeLabel(f.byteSize)}
                {f.pageCount ? ` · ${f.pageCount} page${f.pageCount === 1 ? '' : 's'}` : ''} · {formatDate(f.createdAt)}
              </p>
            </div>
            <Button size="sm" variant={openId === f.id ? 'primary' : 'secondary'} aria-pressed={openId === f.id} onClick={() => onOpen(openId === f.id ? null : f.id)}>
              {openId === f.id ? 'Close' : 'View'}
              <span className="sr-only"> {f.originalName}</span>
            </Button>
          </div>
          <div className="mt-2">
            <ExtractionProgress facsimile={f} />
          </div>
        </li>
      ))}
    </ul>
  );
}
