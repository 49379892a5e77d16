import { useState } from 'react';
import { markerFor } from '@shared/programmes/markers';
import { Button } from '@/components/button';
import { readQuotations, removeQuotation } from './quotations';

/** The passages collected with "Add to programme", with a button to cite one again at the end of the notes. */
export function QuotationsAtHand({ programmeId, onInsert }: { programmeId: string; onInsert: (marker: string) => void }) {
  const [list, setList] = useState(() => readQuotations(programmeId));
  if (list.length === 0) return <p className="text-sm text-ink-muted">Use “Add to programme” on an excerpt to collect passages here.</p>;
  return (
    <ul className="space-y-3">
      {list.map((q) => (
        <li key={`${q.excerptId}-${q.locator}`} className="rounded-soft border border-rule p-3 text-sm">
          {q.sourceTitle && <p className="font-medium">{q.sourceTitle}</p>}
          {q.quotation && <blockquote className="my-1 font-serif text-[1rem] italic leading-relaxed">{q.quotation}</blockquote>}
          <p className="flex flex-wrap items-center gap-2">
            <code>{markerFor(q.excerptId, q.locator)}</code>
            <Button size="sm" variant="quiet" onClick={() => onInsert(markerFor(q.excerptId, q.locator))}>Cite again</Button>
            <Button size="sm" variant="quiet" onClick={() => { removeQuotation(programmeId, q.excerptId); setList(readQuotations(programmeId)); }}>Remove</Button>
          </p>
        </li>
      ))}
    </ul>
  );
}
