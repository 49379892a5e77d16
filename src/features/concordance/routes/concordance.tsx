import { useMemo, useState } from 'react';
import type { ConcordanceEntry } from '@shared/review/types';
import { Alert } from '@/components/alert';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';
import { PageSpinner } from '@/components/spinner';
import { TextField } from '@/components/text-field';
import { errorMessage } from '@/lib/api';
import { useConcordance } from '../api/get-concordance';
import { useUpdateConcordance } from '../api/update-concordance';
import { ConcordanceTable } from '../components/concordance-table';
import { CorrectTermForm } from '../components/correct-term-form';
import { ConcordancePicture } from '@/features/insights/components/concordance-picture'; // insights chart (issue 9)

const fold = (s: string) => s.normalize('NFKD').replace(/\p{M}+/gu, '').toLowerCase();

/** Concordance: what historical writers called each instrument size, from approved excerpts. */
export function Component() {
  const query = useConcordance();
  const update = useUpdateConcordance();
  const [filter, setFilter] = useState('');
  const [editing, setEditing] = useState<{ entry: ConcordanceEntry; sizeSlug: string } | null>(null);
  const [notice, setNotice] = useState('');
  const entries = useMemo(
    () => (query.data?.data ?? []).filter((e) => !filter || fold(e.term).includes(fold(filter)) || e.sizes.some((s) => fold(s.sizeName).includes(fold(filter)))),
    [query.data, filter],
  );

  return (
    <>
      <PageHeader
        title="Concordance"
        description="Instrument terms as the sources write them, with the sizes editors take them to denote, how sure they are, and where to read them."
      />
      <TextField label="Find a term or size" type="search" value={filter} onChange={(e) => setFilter(e.target.value)} containerClassName="mb-4 max-w-sm" />
      <div aria-live="polite" className="mb-3 min-h-6 text-sm text-accent-strong">{notice && `✓ ${notice}`}</div>
      {editing && (
        <CorrectTermForm
          key={`${editing.entry.term}|${editing.sizeSlug}`}
          term={editing.entry.term}
          language={editing.entry.language}
          fromSize={editing.sizeSlug}
          pending={update.isPending}
          error={update.error}
          onCancel={() => setEditing(null)}
          onSubmit={(patch) =>
            update.mutate(patch, {
              onSuccess: (r) => {
                setNotice(`${r.data.affectedMentions} mention(s) in ${r.data.affectedExcerpts.length} excerpt(s) changed; each has a new version.`);
                setEditing(null);
              },
            })
          }
        />
      )}
      {query.isPending ? (
        <PageSpinner label="Loading the concordance…" />
      ) : query.isError ? (
        <Alert tone="danger" title="The concordance could not be loaded">{errorMessage(query.error)}</Alert>
      ) : entries.length === 0 ? (
        <EmptyState title={filter ? 'No term matches' : 'No approved mentions yet'}>
          {filter ? 'Try another spelling; accents are ignored here.' : 'Terms appear once excerpts that name instruments are approved.'}
        </EmptyState>
      ) : (
        <ConcordanceTable entries={entries} onCorrect={query.data.abilities.edit ? (entry, sizeSlug) => setEditing({ entry, sizeSlug }) : undefined} />
      )}
      {/* insights chart (issue 9): terms against sizes, following the filter box */}
      {entries.length > 0 && <div className="mt-10"><ConcordancePicture entries={entries} /></div>}
    </>
  );
}
