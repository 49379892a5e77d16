import type { ReactNode } from 'react';

function time(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : date.toLocaleTimeString('en-GB', { hour: '2-digit', minute: '2-digit' });
}

/** The form's buttons, kept in view at the bottom of long forms, with the state of the browser copy. */
export function SaveBar({ children, savedAt }: { children: ReactNode; savedAt: string | null }) {
  return (
    <div className="sticky bottom-0 z-10 -mx-4 flex flex-wrap items-center gap-3 border-t border-rule bg-paper/95 px-4 py-3 backdrop-blur-sm sm:mx-0 sm:rounded-soft sm:border">
      {children}
      <p className="ml-auto text-sm text-ink-muted" aria-live="polite">
        {savedAt ? `Unsaved changes kept in this browser at ${time(savedAt)}` : ''}
      </p>
    </div>
  );
}
