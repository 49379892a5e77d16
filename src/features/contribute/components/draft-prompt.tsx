import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { formatDate } from '@/lib/format';
import type { StoredDraft } from '../lib/use-form-draft';

export interface DraftPromptProps {
  draft: StoredDraft<unknown>;
  /** The version now on the server, to warn when the draft was made from an older one. */
  currentVersion?: number | null;
  onRestore: () => void;
  onDiscard: () => void;
}

function when(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  const time = date.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });
  return `${formatDate(iso)}, ${time}`;
}

/** Offers back unsaved work found in this browser. */
export function DraftPrompt({ draft, currentVersion, onRestore, onDiscard }: DraftPromptProps) {
  const older = currentVersion != null && draft.baseVersion != null && draft.baseVersion < currentVersion;
  return (
    <Alert
      tone="caution"
      title="Unsaved changes from an earlier visit"
      action={
        <div className="flex flex-wrap gap-2">
          <Button onClick={onRestore}>Restore my changes</Button>
          <Button variant="secondary" onClick={onDiscard}>
            Discard them
          </Button>
        </div>
      }
    >
      <p>
        This browser kept what you typed{draft.savedAt ? ` on ${when(draft.savedAt)}` : ''} but did not save.
        {older && ` It was based on version ${draft.baseVersion}; the record is now at version ${currentVersion}, so check the result before saving.`}
      </p>
    </Alert>
  );
}
