import { useState } from 'react';
import type { ProgrammeView } from '@shared/programmes/types';
import { Button } from '@/components/button';
import { errorMessage } from '@/lib/api';
import { useShareProgramme } from '../api/programmes';

/** A read-only link (32 random bytes): create, rotate (the old link stops working) or revoke. */
export function SharePanel({ programme }: { programme: ProgrammeView }) {
  const share = useShareProgramme(programme.id);
  const [copied, setCopied] = useState(false);
  const url = programme.sharePath ? `${window.location.origin}${programme.sharePath}` : null;
  return (
    <div className="space-y-2 text-sm">
      {url ? (
        <>
          <p>Anyone with this link can read the programme (not edit it):</p>
          <p className="flex flex-wrap items-center gap-2">
            <input readOnly value={url} aria-label="Share link" className="field-control min-w-0 flex-1 text-sm" onFocus={(e) => e.currentTarget.select()} />
            <Button size="sm" variant="secondary" onClick={async () => setCopied(await navigator.clipboard.writeText(url).then(() => true, () => false))}>Copy</Button>
          </p>
          <p className="flex gap-2">
            <Button size="sm" variant="secondary" loading={share.isPending} onClick={() => share.mutate(true)}>New link</Button>
            <Button size="sm" variant="danger" loading={share.isPending} onClick={() => share.mutate(false)}>Stop sharing</Button>
          </p>
        </>
      ) : (
        <Button size="sm" variant="secondary" loading={share.isPending} onClick={() => share.mutate(true)}>Create a read-only link</Button>
      )}
      <p aria-live="polite">{copied ? 'Link copied.' : ''}{share.isError ? <span className="text-danger">{errorMessage(share.error)}</span> : null}</p>
    </div>
  );
}
