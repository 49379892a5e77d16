import { useState, type FormEvent } from 'react';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { TextField } from '@/components/text-field';

export interface RestoreFormProps {
  version: number;
  pending: boolean;
  error: unknown;
  onRestore: (reason: string) => void;
  onCancel: () => void;
}

/** Restoring makes a new version; the reason is kept in the history. */
export function RestoreForm({ version, pending, error, onRestore, onCancel }: RestoreFormProps) {
  const [reason, setReason] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onRestore(reason.trim());
  };
  return (
    <form onSubmit={submit} className="mt-4 space-y-3 rounded-soft border border-rule-strong bg-paper-raised p-4" aria-label={`Restore version ${version}`}>
      <h2 className="font-serif text-xl">Restore version {version}</h2>
      <p className="text-sm text-ink-muted">
        Its content becomes a new version; nothing is overwritten. A version that was approved is published again at once; any other
        version goes to the review queue.
      </p>
      <FormError error={error} title="The version was not restored" fieldLabels={{ reason: 'Reason' }} />
      <TextField label="Why restore it?" required minLength={3} maxLength={500} value={reason} onChange={(e) => setReason(e.target.value)} />
      <div className="flex gap-2">
        <Button type="submit" loading={pending} disabled={reason.trim().length < 3}>
          Restore as a new version
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
