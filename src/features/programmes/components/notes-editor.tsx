import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import type { MarkerProblem } from '@shared/programmes/markers';
import type { ProgrammePreview } from '@shared/programmes/types';
import { errorMessage } from '@/lib/api';
import { previewNotes } from '../api/programmes';

/**
 * Markdown notes with Pandoc citation markers. Problems (malformed markers, unknown ids) are
 * underlined in the text through a backdrop under a transparent textarea, and listed with their
 * line and message. The preview beside it comes from the server (footnotes in the chosen style).
 */
export function NotesEditor({ value, onChange, citationStyle }: { value: string; onChange: (v: string) => void; citationStyle: string }) {
  const [preview, setPreview] = useState<ProgrammePreview | null>(null);
  const [error, setError] = useState<string | null>(null);
  const backdrop = useRef<HTMLDivElement>(null);

  useEffect(() => {
    const controller = new AbortController();
    const timer = setTimeout(() => {
      previewNotes(value, citationStyle, controller.signal).then(
        (p) => { setPreview(p); setError(null); },
        (e) => { if ((e as Error).name !== 'AbortError') setError(errorMessage(e)); },
      );
    }, 400);
    return () => { clearTimeout(timer); controller.abort(); };
  }, [value, citationStyle]);

  // Problems refer to the text that was previewed; drop them once it has changed under them.
  const problems = useMemo(() => (preview ? preview.problems.filter((p) => p.end <= value.length) : []), [preview, value]);

  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <div>
        <label htmlFor="notes" className="block text-sm font-medium">Programme notes</label>
        <p className="text-sm text-ink-muted">Markdown. Cite with <code>[@E1234567, fol. 12v]</code>, <code>[@S1234567]</code>, <code>[@E1; @E2]</code> or <code>[see @E1, p. 3]</code>.</p>
        <div className="relative mt-1">
          <div ref={backdrop} aria-hidden="true" className="field-control pointer-events-none absolute inset-0 overflow-hidden whitespace-pre-wrap break-words font-serif text-[1.0625rem] leading-relaxed text-transparent">
            {underline(value, problems)}
          </div>
          <textarea id="notes" value={value} onChange={(e) => onChange(e.target.value)} onScroll={(e) => { if (backdrop.current) backdrop.current.scrollTop = e.currentTarget.scrollTop; }}
            rows={18} aria-describedby="notes-problems" spellCheck
            className="field-control relative block w-full resize-y bg-transparent font-serif text-[1.0625rem] leading-relaxed" />
        </div>
        <ul id="notes-problems" className="mt-2 space-y-1 text-sm" aria-live="polite">
          {problems.map((p, i) => (
            <li key={i} className="text-danger">Line {p.line}, column {p.column}: {p.message}</li>
          ))}
        </ul>
        {error && <p role="alert" className="text-sm text-danger">{error}</p>}
      </div>
      <PreviewPane preview={preview} />
    </div>
  );
}

function underline(text: string, problems: MarkerProblem[]): ReactNode[] {
  const out: ReactNode[] = [];
  let at = 0;
  for (const [i, p] of [...problems].sort((a, b) => a.start - b.start).entries()) {
    if (p.start < at) continue;
    out.push(text.slice(at, p.start));
    out.push(<mark key={i} className="bg-transparent text-transparent underline decoration-danger decoration-wavy underline-offset-4">{text.slice(p.start, p.end)}</mark>);
    at = p.end;
  }
  out.push(text.slice(at), '\n');
  return out;
}

/** Rendered notes with numbered footnotes (or in-text citations) and the bibliography; the HTML is sanitised by the server. */
export function PreviewPane({ preview }: { preview: ProgrammePreview | null }) {
  if (!preview) return <div className="text-sm text-ink-muted">The preview appears here.</div>;
  return (
    <section aria-label="Preview" className="rounded-soft border border-rule bg-paper-raised p-5 font-serif text-[1.0625rem] leading-relaxed">
      <div className="prose-notes [&_mark.citation-problem]:bg-transparent [&_mark.citation-problem]:underline [&_mark.citation-problem]:decoration-wavy [&_mark.citation-problem]:decoration-danger [&_p]:mb-3" dangerouslySetInnerHTML={{ __html: preview.html }} />
      {preview.styleKind === 'note' && preview.notes.length > 0 && (
        <section className="mt-6 border-t border-rule pt-3 text-[0.9375rem]">
          <h3 className="label-caps text-ink-muted">Notes</h3>
          <ol className="list-decimal pl-6">
            {preview.notes.map((n) => <li key={n.number} id={`fn-${n.number}`} dangerouslySetInnerHTML={{ __html: n.html }} />)}
          </ol>
        </section>
      )}
      {preview.bibliography.length > 0 && (
        <section className="mt-6 border-t border-rule pt-3 text-[0.9375rem]">
          <h3 className="label-caps text-ink-muted">{preview.styleKind === 'note' ? 'Bibliography' : 'References'}</h3>
          {preview.bibliography.map((b) => <p key={b.id} className="pl-8 -indent-8" dangerouslySetInnerHTML={{ __html: b.html }} />)}
        </section>
      )}
    </section>
  );
}
