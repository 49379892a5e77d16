import { useEffect, useState, type FormEvent } from 'react';
import { sourceTypeLabels, sourceTypes } from '@shared/catalogue/vocabulary';
import { Button } from '@/components/button';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';

export interface QueueFilterValues {
  kind: string;
  sourceType: string;
  contributor: string;
  minAgeDays: string;
  lang: string;
  sort: string;
}

/** Selects apply at once; the text fields on "Apply". */
export function QueueFilters({ values, onChange }: { values: QueueFilterValues; onChange: (values: QueueFilterValues) => void }) {
  const [draft, setDraft] = useState(values);
  useEffect(() => setDraft(values), [values]);
  const set = (key: keyof QueueFilterValues, value: string, apply = false) => {
    const next = { ...draft, [key]: value };
    setDraft(next);
    if (apply) onChange(next);
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onChange(draft);
  };
  return (
    <form role="search" aria-label="Filter the review queue" onSubmit={submit} className="mb-4 flex flex-wrap items-end gap-3">
      <Select label="Kind" value={draft.kind} onChange={(e) => set('kind', e.target.value, true)} containerClassName="w-36">
        <option value="">Both</option>
        <option value="source">Sources</option>
        <option value="excerpt">Excerpts</option>
      </Select>
      <Select label="Type of source" value={draft.sourceType} onChange={(e) => set('sourceType', e.target.value, true)} containerClassName="w-56">
        <option value="">All types</option>
        {sourceTypes.map((t) => (
          <option key={t} value={t}>{sourceTypeLabels[t]}</option>
        ))}
      </Select>
      <TextField label="Contributor" hint="Name or id" value={draft.contributor} onChange={(e) => set('contributor', e.target.value)} containerClassName="w-44" />
      <TextField label="Waiting at least" hint="Days" type="number" min={0} inputMode="numeric" value={draft.minAgeDays} onChange={(e) => set('minAgeDays', e.target.value)} containerClassName="w-32" />
      <TextField label="Language" hint="e.g. fr, la" value={draft.lang} onChange={(e) => set('lang', e.target.value)} containerClassName="w-28" />
      <Select label="Order" value={draft.sort} onChange={(e) => set('sort', e.target.value, true)} containerClassName="w-40">
        <option value="oldest">Oldest first</option>
        <option value="newest">Newest first</option>
      </Select>
      <Button type="submit" variant="secondary">Apply</Button>
    </form>
  );
}
