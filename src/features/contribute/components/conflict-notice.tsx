import { Alert } from '@/components/alert';
import { Button } from '@/components/button';

export interface ConflictNoticeProps {
  /** "source" or "excerpt". */
  noun: string;
  onReapply: () => void;
  reapplying: boolean;
  /** Labels of fields someone else also changed, shown after re-applying. */
  overlapping?: string[];
  /** Set after a successful re-apply. */
  reappliedVersion?: number | null;
}

/** Shown after a 409: the person's values stay on screen until they choose what to do. */
export function ConflictNotice({ noun, onReapply, reapplying, overlapping = [], reappliedVersion }: ConflictNoticeProps) {
  if (reappliedVersion != null) {
    return (
      <Alert tone="caution" title={`Your changes now sit on version ${reappliedVersion}`}>
        <p>Fields you did not touch show the latest saved text; fields you changed keep your text. Check them, then save again.</p>
        {overlapping.length > 0 && (
          <p className="mt-1">
            Someone else also changed: <strong>{overlapping.join(', ')}</strong>. Your wording was kept there; compare with the
            {` ${noun}`} page if in doubt.
          </p>
        )}
      </Alert>
    );
  }
  return (
    <Alert
      tone="danger"
      title={`This ${noun} was changed by someone else while you edited`}
      action={
        <Button onClick={onReapply} loading={reapplying}>
          Reload latest and re-apply my changes
        </Button>
      }
    >
      <p>Nothing you typed has been lost: it is still in the form below and kept in this browser.</p>
    </Alert>
  );
}
