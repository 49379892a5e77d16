import type { ReactNode } from 'react';

/** The facsimile and the text side by side on wide screens (the facsimile stays in view), stacked on narrow ones. */
export function BesideFacsimile({ facsimile, children }: { facsimile: ReactNode; children: ReactNode }) {
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="h-[70vh] lg:sticky lg:top-4 lg:h-[calc(100vh-2rem)]">{facsimile}</div>
      <div className="min-w-0">{children}</div>
    </div>
  );
}
