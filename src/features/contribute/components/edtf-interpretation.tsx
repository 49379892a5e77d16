import type { ReactNode } from 'react';
import { describeEdtf, monthName, ReckonerError } from '@shared/reckoner';

/** "1695-01-01" → "1 January 1695". */
export function readableDay(iso: string): string {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(iso);
  return match ? `${Number(match[3])} ${monthName(Number(match[2]))} ${match[1]}` : iso;
}

/** Live reading of an EDTF value beside its input: the label and the days it is searched as. */
export function EdtfInterpretation({ value, id, emptyText = 'Type a date to see how Windway reads it.' }: { value: string; id?: string; emptyText?: string }) {
  let content: ReactNode = <span className="text-ink-muted">{emptyText}</span>;
  if (value.trim()) {
    try {
      const d = describeEdtf(value);
      content = (
        <>
          Reads as <strong>{d.label}</strong>
          <span className="text-ink-muted">
            {' '}
            · searched as{' '}
            <span className="figures">
              {d.earliest === d.latest ? readableDay(d.earliest) : `${readableDay(d.earliest)} to ${readableDay(d.latest)}`}
            </span>
          </span>
        </>
      );
    } catch (error) {
      content = (
        <span className="text-ink-muted">
          Not yet a date Windway reads: {error instanceof ReckonerError ? error.message : 'unknown form.'}
        </span>
      );
    }
  }
  return (
    <p id={id} aria-live="polite" className="mt-1 min-h-6 text-sm">
      {content}
    </p>
  );
}
