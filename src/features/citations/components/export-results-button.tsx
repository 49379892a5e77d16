import { useState } from 'react';
import type { CiteFormat } from '@shared/citations/api';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { errorMessage } from '@/lib/api';
import { citeMany } from '../api/citations';
import { saveText } from './download';
import { StylePicker } from './style-picker';

export interface ExportResultsButtonProps {
  /** Excerpt (E…) or source (S…) ids, e.g. a page of search results or a programme's citations. */
  ids: string[];
  /** File name without extension. */
  name?: string;
}

/** Exports many citations at once through POST /api/cite and saves the file. */
export function ExportResultsButton({ ids, name = 'windway-citations' }: ExportResultsButtonProps) {
  const [format, setFormat] = useState<CiteFormat>('bibtex');
  const [style, setStyle] = useState('notes');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function run() {
    setBusy(true);
    setError(null);
    try {
      const result = await citeMany(ids, format, style);
      saveText(result.data, name, format);
    } catch (e) {
      setError(errorMessage(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-wrap items-end gap-2">
      <Select label="Export as" value={format} onChange={(e) => setFormat(e.target.value as CiteFormat)} options={[
        { value: 'bibtex', label: 'BibTeX' }, { value: 'ris', label: 'RIS' }, { value: 'csl-json', label: 'CSL-JSON' }, { value: 'text', label: 'Formatted text' }, { value: 'html', label: 'HTML' },
      ]} />
      {(format === 'text' || format === 'html') && <StylePicker value={style} onChange={setStyle} />}
      <Button variant="secondary" onClick={run} loading={busy} disabled={ids.length === 0}>
        Export {ids.length} {ids.length === 1 ? 'citation' : 'citations'}
      </Button>
      {error && <p role="alert" className="w-full text-sm text-danger">{error}</p>}
    </div>
  );
}
