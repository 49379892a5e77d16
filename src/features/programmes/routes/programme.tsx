import { useEffect, useState } from 'react';
import { useNavigate, useParams } from 'react-router-dom';
import type { PerformerFields, PieceInput } from '@shared/programmes/schema';
import type { ProgrammeView } from '@shared/programmes/types';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { TextField } from '@/components/text-field';
import { errorMessage, isApiError } from '@/lib/api';
import { StylePicker } from '@/features/citations/components/style-picker';
import { exportUrl, useDeleteProgramme, useProgramme, useUpdateProgramme } from '../api/programmes';
import { ExportLinks } from '../components/export-links';
import { NotesEditor } from '../components/notes-editor';
import { PiecesTable } from '../components/pieces-table';
import { QuotationsAtHand } from '../components/quotations-at-hand';
import { SharePanel } from '../components/share-panel';

interface Draft {
  title: string;
  performanceDate: string;
  venue: string;
  performers: PerformerFields[];
  pieces: PieceInput[];
  notesMarkdown: string;
  citationStyle: string;
}

const toDraft = (p: ProgrammeView): Draft => ({
  title: p.title, performanceDate: p.performanceDate ?? '', venue: p.venue ?? '', performers: p.performers,
  pieces: p.pieces, notesMarkdown: p.notesMarkdown, citationStyle: p.citationStyle,
});

export function Component() {
  const { id = '' } = useParams();
  const programme = useProgramme(id);
  const update = useUpdateProgramme(id);
  const remove = useDeleteProgramme();
  const navigate = useNavigate();
  const [draft, setDraft] = useState<Draft | null>(null);
  const [saved, setSaved] = useState(false);

  useEffect(() => {
    if (programme.data && !draft) setDraft(toDraft(programme.data));
  }, [programme.data, draft]);

  if (programme.isLoading || (!draft && !programme.isError)) return <PageSpinner />;
  if (programme.isError || !programme.data || !draft) return <Alert tone="danger">{errorMessage(programme.error)}</Alert>;
  const current = programme.data;
  const set = (patch: Partial<Draft>) => { setDraft({ ...draft, ...patch }); setSaved(false); };

  async function save() {
    await update.mutateAsync({
      ...draft!, version: current.version, performanceDate: draft!.performanceDate || null, venue: draft!.venue || null,
      pieces: draft!.pieces.map((p) => ({ ...p, composer: p.composer || null, lowest: p.lowest || null, highest: p.highest || null })),
    });
    setSaved(true);
  }
  const fields = isApiError(update.error) ? update.error.fields ?? {} : {};

  return (
    <div>
      <PageHeader title={draft.title || 'Programme'} eyebrow="Programme"
        actions={<>
          <Button onClick={save} loading={update.isPending}>Save</Button>
          <Button variant="danger" onClick={async () => { if (confirm('Delete this programme?')) { await remove.mutateAsync(id); navigate('/programmes'); } }}>Delete</Button>
        </>} />
      <div aria-live="polite" className="mb-4">
        {saved && <Alert tone="success">Saved.</Alert>}
        {update.isError && <Alert tone="danger" title="Not saved">{errorMessage(update.error)}{Object.entries(fields).map(([k, v]) => <div key={k}>{k}: {v}</div>)}</Alert>}
      </div>
      <div className="grid gap-6 xl:grid-cols-[1fr_20rem]">
        <div className="space-y-6">
          <Card title="Details">
            <div className="grid gap-3 sm:grid-cols-3">
              <TextField label="Title" value={draft.title} onChange={(e) => set({ title: e.target.value })} error={fields.title} />
              <TextField label="Date" type="date" value={draft.performanceDate} onChange={(e) => set({ performanceDate: e.target.value })} error={fields.performanceDate} />
              <TextField label="Venue" value={draft.venue} onChange={(e) => set({ venue: e.target.value })} error={fields.venue} />
            </div>
            <fieldset className="mt-4">
              <legend className="text-sm font-medium">Performers</legend>
              {draft.performers.map((p, i) => (
                <div key={i} className="mt-2 flex flex-wrap items-end gap-2">
                  <TextField label="Name" value={p.name} onChange={(e) => set({ performers: draft.performers.map((q, j) => (j === i ? { ...q, name: e.target.value } : q)) })} />
                  <TextField label="Instrument or role" value={p.role ?? ''} onChange={(e) => set({ performers: draft.performers.map((q, j) => (j === i ? { ...q, role: e.target.value } : q)) })} />
                  <Button variant="quiet" size="sm" onClick={() => set({ performers: draft.performers.filter((_, j) => j !== i) })}>Remove</Button>
                </div>
              ))}
              <Button className="mt-2" variant="secondary" size="sm" onClick={() => set({ performers: [...draft.performers, { name: '', role: null }] })}>Add a performer</Button>
            </fieldset>
          </Card>
          <Card title="Pieces">
            <PiecesTable pieces={draft.pieces} onChange={(pieces) => set({ pieces })} />
          </Card>
          <Card title="Notes">
            <div className="mb-4 max-w-md"><StylePicker label="Citation style" value={draft.citationStyle} onChange={(citationStyle) => set({ citationStyle })} /></div>
            <NotesEditor value={draft.notesMarkdown} onChange={(notesMarkdown) => set({ notesMarkdown })} citationStyle={draft.citationStyle} />
          </Card>
        </div>
        <aside className="space-y-6">
          <Card title="Quotations at hand" headingLevel={2}>
            <QuotationsAtHand programmeId={id} onInsert={(marker) => set({ notesMarkdown: `${draft.notesMarkdown.replace(/\s+$/, '')} ${marker}\n` })} />
          </Card>
          <Card title="Export">
            <p className="mb-2 text-sm text-ink-muted">Exports use the saved version.</p>
            <ExportLinks urlFor={(format) => exportUrl(id, format)} />
          </Card>
          <Card title="Share"><SharePanel programme={current} /></Card>
        </aside>
      </div>
    </div>
  );
}
