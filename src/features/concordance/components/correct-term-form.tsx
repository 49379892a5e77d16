import { useState, type FormEvent } from 'react';
import { INSTRUMENT_SIZES } from '@shared/reckoner/sizes';
import type { ConcordancePatch } from '@shared/review/schemas';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { TextField } from '@/components/text-field';

export interface CorrectTermFormProps {
  term: string;
  language: string;
  fromSize: string;
  pending: boolean;
  error: unknown;
  onSubmit: (patch: ConcordancePatch) => void;
  onCancel: () => void;
}

/** Correct what a term denotes, or merge it into another spelling; every affected excerpt gets a new version. */
export function CorrectTermForm({ term, language, fromSize, pending, error, onSubmit, onCancel }: CorrectTermFormProps) {
  const [toSize, setToSize] = useState(fromSize);
  const [merge, setMerge] = useState('');
  const [reason, setReason] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onSubmit({ term, language, fromSize, toSize, ...(merge.trim() ? { mergeInto: { term: merge.trim() } } : {}), ...(reason.trim() ? { reason: reason.trim() } : {}) });
  };
  return (
    <form onSubmit={submit} aria-label={`Correct “${term}”`} className="mb-6 space-y-3 rounded-soft border border-rule-strong bg-paper-raised p-4">
      <h2 className="font-serif text-xl">
        Correct “<span lang={language}>{term}</span>” ({language})
      </h2>
      <FormError error={error} title="The concordance was not changed" fieldLabels={{ toSize: 'Size', 'mergeInto.term': 'Merge into' }} />
      <div className="flex flex-wrap gap-3">
        <Select label="Denotes" value={toSize} onChange={(e) => setToSize(e.target.value)} containerClassName="w-56" options={INSTRUMENT_SIZES.map((s) => ({ value: s.slug, label: s.name }))} />
        <TextField label="Merge into spelling" labelSuffix="(optional)" hint="Every mention is rewritten to this spelling" value={merge} onChange={(e) => setMerge(e.target.value)} containerClassName="w-64" />
        <TextField label="Reason" labelSuffix="(optional)" value={reason} maxLength={300} onChange={(e) => setReason(e.target.value)} containerClassName="min-w-[16rem] flex-1" />
      </div>
      <p className="text-sm text-ink-muted">Each excerpt that uses this term gets a new version with this reason in its history; approved excerpts stay approved.</p>
      <div className="flex gap-2">
        <Button type="submit" loading={pending} disabled={toSize === fromSize && !merge.trim()}>Apply to every mention</Button>
        <Button variant="secondary" onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}
