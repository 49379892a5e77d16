import { useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { Button } from '@/components/button';
import { Card } from '@/components/card';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { TextField } from '@/components/text-field';
import { Alert } from '@/components/alert';
import { errorMessage } from '@/lib/api';
import { useCreateProgramme, usePrograms } from '../api/programmes';

export function Component() {
  const programmes = usePrograms();
  const create = useCreateProgramme();
  const navigate = useNavigate();
  const [title, setTitle] = useState('');

  async function submit(event: FormEvent) {
    event.preventDefault();
    const programme = await create.mutateAsync({ title });
    if (programme) navigate(`/programmes/${programme.id}`);
  }

  return (
    <div>
      <PageHeader title="Programmes" description="Your concert programmes: pieces with the reckoner's verdict, notes with citations, and exports with footnotes and a bibliography." />
      <Card title="New programme" className="mb-8">
        <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
          <TextField label="Title" value={title} onChange={(e) => setTitle(e.target.value)} required containerClassName="min-w-64 flex-1" error={create.error ? errorMessage(create.error) : undefined} />
          <Button type="submit" loading={create.isPending}>Create</Button>
        </form>
      </Card>
      {programmes.isLoading && <PageSpinner />}
      {programmes.isError && <Alert tone="danger">{errorMessage(programmes.error)}</Alert>}
      {programmes.data?.length === 0 && <EmptyState title="No programmes yet">Create one above, then add excerpts to it from their pages.</EmptyState>}
      <ul className="divide-y divide-rule">
        {programmes.data?.map((p) => (
          <li key={p.id} className="flex flex-wrap items-baseline justify-between gap-2 py-3">
            <Link to={`/programmes/${p.id}`} className="font-serif text-xl">{p.title}</Link>
            <span className="text-sm text-ink-muted [font-variant-numeric:tabular-nums]">
              {[p.performanceDate, p.venue, `${p.pieceCount} ${p.pieceCount === 1 ? 'piece' : 'pieces'}`, p.visibility === 'shared' ? 'shared by link' : null].filter(Boolean).join(' · ')}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
