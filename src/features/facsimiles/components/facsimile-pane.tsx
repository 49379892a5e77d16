import { useState } from 'react';
import type { FacsimileView } from '@shared/catalogue/types';
import { Select } from '@/components/select';
import { FacsimileViewer } from './facsimile-viewer';

export interface FacsimilePaneProps {
  facsimiles: FacsimileView[];
  page: number;
  onPageChange: (page: number) => void;
  /** Shown when the source has no facsimile the visitor may see. */
  emptyText?: string;
  className?: string;
}

/** The viewer for a source's facsimiles, with a choice when there are several files. */
export function FacsimilePane({ facsimiles, page, onPageChange, emptyText = 'No facsimile to show.', className }: FacsimilePaneProps) {
  const [chosenId, setChosenId] = useState<number | null>(facsimiles[0]?.id ?? null);
  const chosen = facsimiles.find((f) => f.id === chosenId) ?? facsimiles[0];
  if (!chosen) {
    return <p className="rounded-soft border border-dashed border-rule-strong px-4 py-8 text-center text-ink-muted">{emptyText}</p>;
  }
  return (
    <div className={className}>
      {facsimiles.length > 1 && (
        <Select
          label="Facsimile file"
          value={String(chosen.id)}
          onChange={(event) => {
            setChosenId(Number(event.target.value));
            onPageChange(1);
          }}
          options={facsimiles.map((f) => ({ value: String(f.id), label: f.originalName }))}
          containerClassName="mb-2"
        />
      )}
      <FacsimileViewer key={chosen.id} facsimile={chosen} page={page} onPageChange={onPageChange} className="min-h-0 flex-1" />
    </div>
  );
}
