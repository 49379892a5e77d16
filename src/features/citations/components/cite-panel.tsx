import { useState } from 'react';
import type { CiteFormat } from '@shared/citations/api';
import { Alert } from '@/components/alert';
import { Button, buttonClasses } from '@/components/button';
import { Card } from '@/components/card';
import { Select } from '@/components/select';
import { Spinner } from '@/components/spinner';
import { errorMessage } from '@/lib/api';
import { citeDownloadUrl, useCitation, type CiteTarget } from '../api/citations';
import { copyText } from './download';
import { StylePicker } from './style-picker';

const formats: { value: CiteFormat; label: string }[] = [
  { value: 'text', label: 'Formatted text' },
  { value: 'html', label: 'Formatted (rich text)' },
  { value: 'bibtex', label: 'BibTeX (.bib)' },
  { value: 'ris', label: 'RIS (.ris)' },
  { value: 'csl-json', label: 'CSL-JSON (.json)' },
];

export interface CitePanelProps {
  target: CiteTarget;
  /** An earlier approved version to cite; the current approved version by default. */
  version?: number;
}

/** Cite this excerpt or source: pick a format and style, see it, copy it, or download it. */
export function CitePanel({ target, version }: CitePanelProps) {
  const [format, setFormat] = useState<CiteFormat>('text');
  const [style, setStyle] = useState('notes');
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const citation = useCitation(target, format, style, version);
  const styled = format === 'text' || format === 'html';
  const entry = citation.data?.entries?.[0];

  async function copy() {
    if (!citation.data) return;
    const text = styled && entry ? [entry.note ?? entry.citation, entry.bibliography].filter(Boolean).join('\n\n') : citation.data.data;
    setCopied((await copyText(format === 'html' ? text.replace(/<[^>]+>/g, '') : text)) ? 'yes' : 'no');
  }

  return (
    <Card title="Cite" headingLevel={2} as="section">
      <div className="grid gap-3 sm:grid-cols-2">
        <Select label="Format" value={format} options={formats} onChange={(e) => { setFormat(e.target.value as CiteFormat); setCopied(null); }} />
        {styled && <StylePicker value={style} onChange={(id) => { setStyle(id); setCopied(null); }} />}
      </div>
      <div className="mt-4 min-h-16" aria-live="polite">
        {citation.isLoading && <Spinner label="Formatting the citation…" />}
        {citation.isError && <Alert tone="danger">{errorMessage(citation.error)}</Alert>}
        {citation.data && styled && entry && (
          <dl className="space-y-3 font-serif text-[1.0625rem] leading-relaxed">
            <div>
              <dt className="label-caps text-ink-muted">{entry.note !== undefined ? 'Footnote' : 'In the text'}</dt>
              <dd dangerouslySetInnerHTML={format === 'html' ? { __html: entry.note ?? entry.citation ?? '' } : undefined}>{format === 'html' ? undefined : (entry.note ?? entry.citation)}</dd>
            </div>
            {entry.shortNote && (
              <div>
                <dt className="label-caps text-ink-muted">Later notes</dt>
                <dd dangerouslySetInnerHTML={format === 'html' ? { __html: entry.shortNote } : undefined}>{format === 'html' ? undefined : entry.shortNote}</dd>
              </div>
            )}
            <div>
              <dt className="label-caps text-ink-muted">{entry.note !== undefined ? 'Bibliography' : 'Reference list'}</dt>
              <dd className="pl-8 -indent-8" dangerouslySetInnerHTML={format === 'html' ? { __html: entry.bibliography } : undefined}>{format === 'html' ? undefined : entry.bibliography}</dd>
            </div>
          </dl>
        )}
        {citation.data && !styled && (
          <pre className="max-h-72 overflow-auto whitespace-pre-wrap rounded-soft border border-rule bg-paper-sunk p-3 text-sm">{citation.data.data}</pre>
        )}
      </div>
      <div className="mt-4 flex flex-wrap items-center gap-2">
        <Button variant="secondary" size="sm" onClick={copy} disabled={!citation.data}>Copy</Button>
        {(['bibtex', 'ris', 'csl-json'] as const).map((f) => (
          <a key={f} className={buttonClasses('quiet', 'sm')} href={citeDownloadUrl(target, f, style, version)} download>
            Download {f === 'bibtex' ? '.bib' : f === 'ris' ? '.ris' : '.json'}
          </a>
        ))}
        {copied === 'yes' && <span role="status" className="text-sm text-ink-muted">Copied.</span>}
        {copied === 'no' && <span role="status" className="text-sm text-danger">Copying is not allowed here; select the text instead.</span>}
      </div>
    </Card>
  );
}
