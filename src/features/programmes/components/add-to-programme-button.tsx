import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { markerFor } from '@shared/programmes/markers';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { errorMessage } from '@/lib/api';
import { useSession } from '@/features/auth/api/get-session';
import { getProgramme, programmesQueryOptions, updateProgramme } from '../api/programmes';
import { addQuotation } from './quotations';

export interface AddToProgrammeButtonProps {
  excerptId: string;
  /** The formatted locator, e.g. "fol. 12v" (shared/catalogue/locator formatLocator). */
  locator?: string | null;
  /** The passage to keep at hand beside the notes (e.g. the translation or transcription). */
  quotation?: string | null;
  sourceTitle?: string | null;
}

/** Appends `[@id, locator]` to a programme's notes and keeps the quotation at hand. Signed-in readers only. */
export function AddToProgrammeButton({ excerptId, locator = null, quotation = null, sourceTitle = null }: AddToProgrammeButtonProps) {
  const session = useSession();
  const [open, setOpen] = useState(false);
  const programmes = useQuery({ ...programmesQueryOptions, enabled: open });
  const [choice, setChoice] = useState('');
  const [state, setState] = useState<{ busy: boolean; done: string | null; error: string | null }>({ busy: false, done: null, error: null });
  const selected = choice || programmes.data?.[0]?.id || '';

  async function add() {
    if (!selected) return;
    setState({ busy: true, done: null, error: null });
    try {
      const programme = await getProgramme(selected);
      const marker = markerFor(excerptId, locator);
      const notes = programme.notesMarkdown.replace(/\s+$/, '');
      await updateProgramme(selected, { version: programme.version, notesMarkdown: `${notes}${notes ? ' ' : ''}${marker}\n` });
      addQuotation(selected, { excerptId, locator, quotation, sourceTitle, addedAt: new Date().toISOString() });
      setState({ busy: false, done: selected, error: null });
    } catch (error) {
      setState({ busy: false, done: null, error: errorMessage(error) });
    }
  }

  if (!session.user) {
    return session.isPending ? null : <p className="text-sm text-ink-muted"><Link to="/sign-in">Sign in</Link> to add this passage to a programme.</p>;
  }
  if (!open) return <Button variant="secondary" size="sm" onClick={() => setOpen(true)}>Add to programme</Button>;
  return (
    <div className="flex flex-wrap items-end gap-2 rounded-soft border border-rule p-3">
      {programmes.data && programmes.data.length === 0 ? (
        <p className="text-sm">You have no programme yet. <Link to="/programmes">Start one</Link>.</p>
      ) : (
        <>
          <Select label="Programme" value={selected} onChange={(e) => setChoice(e.target.value)} disabled={!programmes.data}
            options={(programmes.data ?? []).map((p) => ({ value: p.id, label: p.title }))} />
          <Button size="sm" onClick={add} loading={state.busy} disabled={!selected}>Add {markerFor(excerptId, locator)}</Button>
        </>
      )}
      <Button variant="quiet" size="sm" onClick={() => setOpen(false)}>Close</Button>
      <div aria-live="polite" className="w-full text-sm">
        {state.done && <span>Added. <Link to={`/programmes/${state.done}`}>Open the programme</Link></span>}
        {state.error && <span className="text-danger">{state.error}</span>}
        {programmes.isError && <span className="text-danger">{errorMessage(programmes.error)}</span>}
      </div>
    </div>
  );
}
