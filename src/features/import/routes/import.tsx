import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { ImportFormat } from '@shared/citations/import';
import type { ImportResult } from '@shared/citations/import-types';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { PageHeader } from '@/components/page-header';
import { Select } from '@/components/select';
import { errorMessage, isApiError } from '@/lib/api';
import { importSources, previewFile, previewText } from '../api/import';
import { PreviewTable, type Row } from '../components/preview-table';

/** /import — paste or upload BibTeX/RIS, check and adjust the mapped fields, then create drafts (all or none). */
export function Component() {
  const [text, setText] = useState('');
  const [file, setFile] = useState<File | null>(null);
  const [format, setFormat] = useState<'' | ImportFormat>('');
  const [rows, setRows] = useState<Row[] | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<unknown>(null);
  const [done, setDone] = useState<ImportResult | null>(null);

  async function preview() {
    setBusy(true); setError(null); setDone(null);
    try {
      const result = file ? await previewFile(file, format || undefined) : await previewText(text, format || undefined);
      setRows(result.entries.map((entry) => ({ entry, fields: entry.fields, include: entry.duplicates.every((d) => d.id === null) })));
    } catch (e) {
      setError(e); setRows(null);
    } finally { setBusy(false); }
  }

  async function run() {
    if (!rows) return;
    setBusy(true); setError(null);
    try {
      setDone(await importSources(rows.filter((r) => r.include).map((r) => r.fields)));
      setRows(null);
    } catch (e) { setError(e); } finally { setBusy(false); }
  }

  const serverErrors = isApiError(error) ? error.fields ?? {} : {};
  const chosen = rows?.filter((r) => r.include).length ?? 0;
  return (
    <div>
      <PageHeader title="Import sources" eyebrow="Contribute" description="Create draft sources from BibTeX or RIS. Nothing is imported until you confirm, and then all the chosen entries are imported together or none." />
      <Card title="1. Paste or upload">
        <label htmlFor="import-text" className="block text-sm font-medium">BibTeX or RIS text</label>
        <textarea id="import-text" rows={10} className="field-control mt-1 w-full font-mono text-sm" value={text} onChange={(e) => { setText(e.target.value); setFile(null); }} disabled={!!file} />
        <div className="mt-3 flex flex-wrap items-end gap-3">
          <label className="text-sm">Or a file (.bib, .ris) <input type="file" accept=".bib,.bibtex,.ris,text/plain" className="ml-2" onChange={(e) => setFile(e.target.files?.[0] ?? null)} /></label>
          <Select label="Format" value={format} onChange={(e) => setFormat(e.target.value as '' | ImportFormat)} options={[{ value: '', label: 'Detect' }, { value: 'bibtex', label: 'BibTeX' }, { value: 'ris', label: 'RIS' }]} />
          <Button onClick={preview} loading={busy && !rows} disabled={!text.trim() && !file}>Preview</Button>
        </div>
      </Card>
      <div aria-live="polite" className="my-4">
        {error ? <Alert tone="danger" title="Not imported">{errorMessage(error)}</Alert> : null}
        {done && <Alert tone="success" title={`${done.created.length} draft ${done.created.length === 1 ? 'source' : 'sources'} created`}>
          <ul>{done.created.map((c) => <li key={c.id}><Link to={`/sources/${c.id}`}>{c.title}</Link></li>)}</ul>
        </Alert>}
      </div>
      {rows && (
        <Card title="2. Check the entries">
          <p className="mb-3 text-sm text-ink-muted">Edit a field to change how it is mapped. Likely duplicates (same title, date and shelfmark as a source already here) start unticked.</p>
          <PreviewTable rows={rows} onChange={setRows} serverErrors={serverErrors} />
          <Button className="mt-4" onClick={run} loading={busy} disabled={chosen === 0}>Import {chosen} as drafts</Button>
        </Card>
      )}
    </div>
  );
}
