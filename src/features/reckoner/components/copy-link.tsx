import { useEffect, useState } from 'react';
import { Button } from '@/components/button';

/** Copies the page's address, which carries every input, so a reckoning can be shared. */
export function CopyLinkButton() {
  const [status, setStatus] = useState<'idle' | 'copied' | 'failed'>('idle');

  useEffect(() => {
    if (status === 'idle') return;
    const timer = setTimeout(() => setStatus('idle'), 4000);
    return () => clearTimeout(timer);
  }, [status]);

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(window.location.href);
      setStatus('copied');
    } catch {
      setStatus('failed');
    }
  };

  return (
    <div className="flex flex-col items-start gap-1 sm:items-end">
      <Button variant="secondary" size="sm" onClick={() => void copy()}>
        Copy link to this reckoning
      </Button>
      <p role="status" className="min-h-5 text-sm text-ink-muted">
        {status === 'copied' && 'Link copied.'}
        {status === 'failed' && 'Could not copy: the address bar holds the same link.'}
      </p>
    </div>
  );
}
