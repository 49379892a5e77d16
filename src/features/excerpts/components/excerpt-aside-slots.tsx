import type { ReactNode } from 'react';

export interface ExcerptAsideSlotsProps {
  /** Citation export (BibTeX, RIS, CSL-JSON, formatted notes) — mounted by the citations feature. */
  cite?: ReactNode;
  /** "Add to programme" — mounted by the programmes feature. */
  programme?: ReactNode;
}

/**
 * Places on the excerpt page where other features plug in their panels. The route
 * (src/features/excerpts/routes/excerpt.tsx) passes them in; empty slots render nothing visible.
 */
export function ExcerptAsideSlots({ cite, programme }: ExcerptAsideSlotsProps) {
  return (
    <div className="space-y-4">
      <div data-slot="cite-panel">{cite}</div>
      <div data-slot="add-to-programme">{programme}</div>
    </div>
  );
}
