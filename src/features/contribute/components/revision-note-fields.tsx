import { useState } from 'react';
import { Checkbox } from '@/components/checkbox';
import { TextField } from '@/components/text-field';

/** The note an edit carries into the revision history, and an editor's choice to publish it at once. */
export function useRevisionNote() {
  const [reason, setReason] = useState('');
  const [publish, setPublish] = useState(false);
  const [error, setError] = useState<string | undefined>();
  return {
    reason,
    publish,
    error,
    setReason: (value: string) => {
      setReason(value);
      if (value.trim()) setError(undefined);
    },
    setPublish,
    /** False (and a message on the field) when publishing without a reason; the server would refuse it too. */
    check(): boolean {
      const missing = publish && !reason.trim();
      setError(missing ? 'Say why this change is published without review.' : undefined);
      return !missing;
    },
    /** The PATCH body's `reason` and `publish`. */
    payload(): { reason?: string; publish?: true } {
      return { reason: reason.trim() || undefined, ...(publish ? { publish: true as const } : {}) };
    },
  };
}

export type RevisionNote = ReturnType<typeof useRevisionNote>;

interface RevisionNoteFieldsProps {
  note: RevisionNote;
  /** An editor editing approved material may publish the change without a new review. */
  canPublish: boolean;
}

export function RevisionNoteFields({ note, canPublish }: RevisionNoteFieldsProps) {
  const publishing = canPublish && note.publish;
  return (
    <div className="space-y-3">
      {canPublish && (
        <Checkbox
          label="Publish this change at once, without a new review"
          hint="For editors’ corrections that need no second reading: readers see the new version straight away, and the history shows who published it and why."
          checked={note.publish}
          onChange={(event) => note.setPublish(event.target.checked)}
        />
      )}
      <TextField
        label={publishing ? 'Why this change is published without review' : 'What changed, for the revision history'}
        labelSuffix={publishing ? undefined : '(optional)'}
        value={note.reason}
        onChange={(event) => note.setReason(event.target.value)}
        error={publishing ? note.error : undefined}
        aria-required={publishing || undefined}
        maxLength={500}
      />
    </div>
  );
}
